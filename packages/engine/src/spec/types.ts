/**
 * The run spec and result as the engine sees them. They mirror the shared contracts
 * (packages/contracts/src/engine) field for field, but the engine library imports nothing
 * of ours, so the shapes are restated here. The contracts schema fixes the names.
 */
import type { Distribution } from "../distributions/types.js";
import type { PerilProfile, PerilResult, Portfolio } from "../peril/types.js";

/** One uncertain input; defined once in distributions/types.ts. */
export type { Distribution };

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

/** Gases that may be given as concentrations, with the unit key each takes. */
export const CONCENTRATION_KEYS = { co2: "ppm", ch4: "ppb", n2o: "ppb" } as const;
export type ConcentrationGas = keyof typeof CONCENTRATION_KEYS;

export const CLIMATE_INPUTS = [
  "ecs",
  "f2x",
  "upperHeatCapacity",
  "deepHeatCapacity",
  "heatExchange",
  "deepEfficacy",
] as const;
export type ClimateInput = (typeof CLIMATE_INPUTS)[number];

export const FORCING_EXPRESSIONS = ["ar6", "etminan-2016", "myhre-1998"] as const;
export type ForcingExpressionName = (typeof FORCING_EXPRESSIONS)[number];

/** Per agent: an ERF series (W m-2) or, for CO2/CH4/N2O, concentrations (ppm / ppb). */
export type AgentSeries = { erf: number[] } | { ppm: number[] } | { ppb: number[] };

/** What each agent may be given as: ERF for all, CO2 also in ppm, CH4 and N2O also in ppb. */
export type PathwayAgents = { co2?: { erf: number[] } | { ppm: number[] } } & {
  [G in "ch4" | "n2o"]?: { erf: number[] } | { ppb: number[] };
} & { [A in Exclude<ForcingAgent, ConcentrationGas>]?: { erf: number[] } };

export interface PathwaySpec {
  id: string;
  name: string;
  startYear: number;
  agents: PathwayAgents;
}

export interface Correlation {
  between: [string, string];
  rank: number;
}

export interface ObservationalConstraint {
  from: number;
  to: number;
  observed: number;
  /** Observational uncertainty of the window's mean warming, 1 sd (K). */
  sd: number;
  /**
   * Internal variability of the window's mean warming, 1 sd (K): the part of the observed
   * warming no forced response explains. The likelihood uses √(sd² + internalVariability²).
   * Default DEFAULT_INTERNAL_VARIABILITY (spec/constraint-defaults.ts).
   */
  internalVariability: number;
}

export interface ModelSpec {
  climate: Record<ClimateInput, Distribution>;
  agents: Partial<Record<ForcingAgent, { scale: Distribution }>>;
  correlations: Correlation[];
  constraint: ObservationalConstraint | null;
  forcingExpression: ForcingExpressionName;
}

export type SamplingMethod = "latin-hypercube" | "monte-carlo";

/** A run spec with every default applied: what the engine runs and hashes. */
export interface RunSpec {
  seed: string;
  members: number;
  sampling: SamplingMethod;
  baseline: [number, number];
  percentiles: number[];
  thresholds: number[];
  horizons: number[];
  pathways: PathwaySpec[];
  model: ModelSpec;
  /** Peril lens (peril/): profiles applied at the horizons; absent when none are asked for. */
  perils?: PerilProfile[];
  /** Portfolio baseline the profiles project; only with perils. */
  portfolio?: Portfolio;
}

/** A run spec as a user may write it: the optional parts may be left out. */
export type RunSpecInput = Omit<RunSpec, "baseline" | "percentiles" | "thresholds" | "horizons" | "model"> & {
  baseline?: [number, number];
  percentiles?: number[];
  thresholds?: number[];
  horizons?: number[];
  perils?: PerilProfile[];
  portfolio?: Portfolio;
  model: Omit<ModelSpec, "agents" | "correlations" | "constraint" | "forcingExpression"> & {
    agents?: ModelSpec["agents"];
    correlations?: Correlation[];
    constraint?: (Omit<ObservationalConstraint, "internalVariability"> & { internalVariability?: number }) | null;
    forcingExpression?: ForcingExpressionName;
  };
};

/** Percentile values keyed "p" + percentile: { p5, p17, p50, p83, p95 }. */
export type PercentileSet = Record<string, number>;
/** Per-year series keyed like PercentileSet plus "mean". */
export type PercentileSeries = Record<string, number[]>;

export interface HorizonResult {
  year: number;
  temperature: PercentileSet;
  exceedance: Record<string, number>;
  committed: PercentileSet;
  /** Distribution-free 95 % interval of each temperature percentile; null when too few members. */
  precision: Record<string, [number, number] | null>;
  forcing: PercentileSet;
  forcingByAgent: Record<string, PercentileSet>;
}

export interface SensitivityEntry {
  input: string;
  horizon: number;
  /** Spearman's rank correlation of the input with the horizon warming (weighted under a constraint). */
  index: number;
  /**
   * The input's first-order share (0–1) of the variance of the horizon warming (Sobol main
   * effect from the ensemble itself; weighted under a constraint). Optional in the type
   * because results of engine versions before 0.3.0 lack it; this engine always sets it.
   */
  varianceShare?: number;
}

export interface ConstraintResult {
  from: number;
  to: number;
  observed: number;
  sd: number;
  /**
   * Internal variability used (1 sd, K) and the likelihood's total sd √(sd² + internalVariability²).
   * This engine always writes both; optional because results stored by engines before them lack them.
   */
  internalVariability?: number;
  likelihoodSd?: number;
  effectiveMembers: number;
  windowWarmingPrior: PercentileSet;
  windowWarmingPosterior: PercentileSet;
  ecsPrior: PercentileSet;
  ecsPosterior: PercentileSet;
}

export interface PathwayResult {
  id: string;
  name: string;
  years: number[];
  temperature: PercentileSeries;
  forcing: PercentileSeries;
  imbalance: PercentileSeries;
  exceedance: Record<string, number[]>;
  crossing: Record<string, Record<string, number | null>>;
  /**
   * Per threshold, per year: share of members whose first crossing falls in that year. This
   * engine always writes it; optional because results stored by engines before it have none
   * (the contracts' result schema reads those too).
   */
  crossingShare?: Record<string, number[]>;
  horizons: HorizonResult[];
  sensitivity: SensitivityEntry[];
  effectiveMembers: number;
  constraint: ConstraintResult | null;
}

export interface RunResult {
  engineVersion: string;
  inputHash: string;
  resultHash: string;
  members: number;
  effectiveMembers: number;
  implied: { ecs: PercentileSet; tcr: PercentileSet };
  pathways: PathwayResult[];
  /** Peril lens results; present only when the spec carried at least one peril profile. */
  perils?: PerilResult;
}
