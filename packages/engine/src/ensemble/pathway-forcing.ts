import { gasForcingSeries } from "../forcing/gas-forcing.js";
import { FORCING_AGENTS, type ConcentrationGas, type ForcingAgent, type PathwaySpec, type RunSpec } from "../spec/types.js";
import { SpecError } from "../spec/spec-error.js";

/** A pathway's forcing, arranged for the yearly loop. */
export interface PathwayForcing {
  startYear: number;
  years: number;
  /** Agents the pathway carries, in agent order, with their ERF series (W m-2, unscaled). */
  agents: ForcingAgent[];
  base: Float64Array[];
  /** Per agent: index of its scale column among the model inputs, or -1 if its scale is fixed. */
  scaleInput: number[];
  /** Per agent: its fixed scale (1 when the model does not name it). */
  fixedScale: number[];
  /** Σ over fixed-scale agents of scale·base: one series instead of one per agent. */
  fixedTotal: Float64Array;
  /** Varying-scale agents, padded to 0, 4, 8 or 12 slots (the forcing kernel takes four at a time). */
  scaleWidth: number;
  /** Per slot: the model-input column of its scale. */
  slotColumns: number[];
  /** Per slot, its agent's base series: slotBase[slot·years + t] (zeros for padding). */
  slotBase: Float64Array;
}

/**
 * Turns each agent's series into ERF: given as "erf", or CO2 ppm / CH4, N2O ppb through the
 * model's concentration expression (forcing module; by default the Meinshausen et al. 2020 re-fit used in IPCC AR6).
 * Agents whose scale is fixed are summed once here, so the member loop only touches the
 * agents whose scale varies between members.
 */
export function buildPathwayForcing(spec: RunSpec, index: number, inputNames: string[]): PathwayForcing {
  const pathway: PathwaySpec = spec.pathways[index]!;
  const agents = FORCING_AGENTS.filter((a) => pathway.agents[a] !== undefined);
  const years = seriesLength(pathway);
  // Every gas given as a concentration, for the expressions' overlap terms (the others are
  // held at their 1750 values by the forcing module).
  const concentrations: Partial<Record<ConcentrationGas, number[]>> = {};
  for (const gas of ["co2", "ch4", "n2o"] as const) {
    const series = pathway.agents[gas];
    if (series && "ppm" in series) concentrations[gas] = series.ppm;
    if (series && "ppb" in series) concentrations[gas] = series.ppb;
  }
  const base = agents.map((agent) => {
    const series = pathway.agents[agent]!;
    if ("erf" in series) return Float64Array.from(series.erf);
    try {
      return gasForcingSeries(spec.model.forcingExpression, agent as ConcentrationGas, concentrations, years);
    } catch (error) {
      const key = "ppm" in series ? "ppm" : "ppb";
      throw SpecError.fromRangeError(`pathways[${index}].agents.${agent}.${key}`, error);
    }
  });
  const scaleInput: number[] = [];
  const fixedScale: number[] = [];
  const fixedTotal = new Float64Array(years);
  agents.forEach((agent, k) => {
    const entry = spec.model.agents[agent];
    const fixed = !entry ? 1 : entry.scale.type === "fixed" ? entry.scale.value : null;
    scaleInput.push(fixed === null ? inputNames.indexOf(agent) : -1);
    fixedScale.push(fixed ?? 1);
    if (fixed !== null) for (let t = 0; t < years; t++) fixedTotal[t]! += fixed * base[k]![t]!;
  });
  base.forEach((series, k) => {
    for (let t = 0; t < years; t++)
      if (!Number.isFinite(series[t]!))
        throw new SpecError(`pathways[${index}].agents.${agents[k]}`, `gives a non-finite forcing in year ${pathway.startYear + t}`);
  });
  const varying = agents.map((_, k) => k).filter((k) => scaleInput[k]! >= 0 && base[k]!.some((v) => v !== 0));
  const scaleWidth = varying.length === 0 ? 0 : Math.ceil(varying.length / 4) * 4;
  const slotBase = new Float64Array(scaleWidth * years);
  varying.forEach((k, j) => slotBase.set(base[k]!, j * years));
  const slotColumns = varying.map((k) => scaleInput[k]!);
  return { startYear: pathway.startYear, years, agents, base, scaleInput, fixedScale, fixedTotal, scaleWidth, slotColumns, slotBase };
}

export function seriesLength(pathway: PathwaySpec): number {
  for (const series of Object.values(pathway.agents)) {
    if (!series) continue;
    const values = "erf" in series ? series.erf : "ppm" in series ? series.ppm : series.ppb;
    return values.length;
  }
  return 0;
}
