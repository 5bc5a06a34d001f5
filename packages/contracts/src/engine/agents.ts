/**
 * Forcing agents a pathway may carry. Ids are ours; the list follows the usual assessment
 * breakdown (AR6 WGI Ch. 7 Table 7.8 groups forcing the same way).
 */
export const FORCING_AGENTS = [
  "co2",
  "ch4",
  "n2o",
  "other-wmghg",
  "ozone",
  "aerosol-radiation",
  "aerosol-cloud",
  "land-use",
  "solar",
  "volcanic",
  "other",
] as const;

export type ForcingAgent = (typeof FORCING_AGENTS)[number];

export const AGENT_LABELS: Record<ForcingAgent, string> = {
  co2: "CO2",
  ch4: "CH4",
  n2o: "N2O",
  "other-wmghg": "Other well-mixed gases",
  ozone: "Ozone",
  "aerosol-radiation": "Aerosol–radiation",
  "aerosol-cloud": "Aerosol–cloud",
  "land-use": "Land-use albedo",
  solar: "Solar",
  volcanic: "Volcanic",
  other: "Other",
};

/** Agents that may be given as concentrations and the unit they take. */
export const CONCENTRATION_UNITS = { co2: "ppm", ch4: "ppb", n2o: "ppb" } as const;

/** Climate inputs of the two-layer model, with units. */
export const CLIMATE_INPUTS = [
  "ecs",
  "f2x",
  "upperHeatCapacity",
  "deepHeatCapacity",
  "heatExchange",
  "deepEfficacy",
] as const;
export type ClimateInput = (typeof CLIMATE_INPUTS)[number];

export const CLIMATE_INPUT_UNITS: Record<ClimateInput, string> = {
  ecs: "K",
  f2x: "W m-2",
  upperHeatCapacity: "W yr m-2 K-1",
  deepHeatCapacity: "W yr m-2 K-1",
  heatExchange: "W m-2 K-1",
  deepEfficacy: "1",
};

/** Published concentration-to-forcing expressions the engine implements: the Meinshausen et al. 2020 re-fit used
 * in IPCC AR6 WGI Ch. 7, Etminan et al. 2016, Myhre et al. 1998. */
export const FORCING_EXPRESSIONS = ["ar6", "etminan-2016", "myhre-1998"] as const;
export type ForcingExpression = (typeof FORCING_EXPRESSIONS)[number];
