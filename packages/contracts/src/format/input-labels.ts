import { AGENT_LABELS, CLIMATE_INPUT_UNITS, type ClimateInput, type ForcingAgent } from "../engine/agents.js";

/** Plain names for the model's uncertain inputs, shared by the editor, the sensitivity budget and the PDF report. */
export const CLIMATE_INPUT_LABELS: Record<ClimateInput, string> = {
  ecs: "Equilibrium climate sensitivity (ECS)",
  f2x: "Forcing for doubled CO2 (F2x)",
  upperHeatCapacity: "Upper-layer heat capacity",
  deepHeatCapacity: "Deep-ocean heat capacity",
  heatExchange: "Heat exchange coefficient",
  deepEfficacy: "Deep-ocean efficacy",
};

export const CLIMATE_INPUT_SHORT: Record<ClimateInput, string> = {
  ecs: "ECS",
  f2x: "F2x",
  upperHeatCapacity: "Upper heat capacity",
  deepHeatCapacity: "Deep heat capacity",
  heatExchange: "Heat exchange",
  deepEfficacy: "Deep efficacy",
};

export function inputLabel(input: string, short = true): string {
  if (input in CLIMATE_INPUT_LABELS) return (short ? CLIMATE_INPUT_SHORT : CLIMATE_INPUT_LABELS)[input as ClimateInput];
  if (input in AGENT_LABELS) return `${AGENT_LABELS[input as ForcingAgent]} scale`;
  return input;
}

/** Unit of a forcing scale factor (a multiplier of the agent's series), the same on every screen. */
export const SCALE_FACTOR_UNIT = "×";

export function inputUnit(input: string): string {
  return input in CLIMATE_INPUT_UNITS ? CLIMATE_INPUT_UNITS[input as ClimateInput] : SCALE_FACTOR_UNIT;
}
