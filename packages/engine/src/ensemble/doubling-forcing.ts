import { gasForcingSeries } from "../forcing/gas-forcing.js";
import { AR6_1750_CONCENTRATIONS } from "../forcing/reference-concentrations.js";
import type { ForcingExpressionName, PathwaySpec } from "../spec/types.js";

/**
 * Where a pathway's members take their forcing at doubled CO2 (F2x) from:
 * * "concentration": the pathway gives CO2 in ppm, so the forcing a member feels at doubled
 *   CO2 is the model's own concentration expression at 2 × the 1750 level, times the
 *   member's CO2 scale — the same expression and scale that turn the pathway's ppm into
 *   forcing;
 * * "erf": the pathway gives CO2 (if at all) as ERF; then the spec's sampled f2x stands for
 *   the ERF of doubled CO2 on that series' scale, times the member's CO2 scale.
 * F2x and the CO2 scale are one physical uncertainty (how strongly CO2 forces), so a
 * member's feedback λ = scale_co2 · F2x / ECS makes its equilibrium response to doubled
 * CO2 exactly its sampled ECS (ECS = F2x/λ, Gregory et al. 2004's definition of the
 * equilibrium as forcing over feedback; common practice in two-layer emulators).
 */
export type DoublingSource = "concentration" | "erf";

export function doublingSourceOf(pathway: PathwaySpec): DoublingSource {
  const co2 = pathway.agents.co2;
  return co2 !== undefined && "ppm" in co2 ? "concentration" : "erf";
}

/**
 * The concentration expression's forcing for CO2 doubled from its 1750 level (278.3 →
 * 556.6 ppm, CH4 and N2O at their 1750 levels), W m-2. For the AR6 expression this is
 * about 3.93 W m-2, the ERF for doubled CO2 assessed in IPCC AR6 WGI Chapter 7 (Forster
 * et al. 2021, Section 7.3.2.1: 3.93 ± 0.47 W m-2).
 */
export function expressionDoublingForcing(expression: ForcingExpressionName): number {
  return gasForcingSeries(expression, "co2", { co2: [2 * AR6_1750_CONCENTRATIONS.co2] }, 1)[0]!;
}

/**
 * Per member, the forcing it feels at doubled CO2: scale_co2[m] · F2x, with F2x the sampled
 * f2x[m] ("erf") or the expression's constant ("concentration"). `co2Scale` is the CO2
 * scale column, or null when the model does not make it uncertain (scale 1 or its fixed value
 * is then `fixedCo2Scale`). Written into out[lo, hi) (default: all of it); cost O(members).
 */
export function fillDoublingForcing(
  source: DoublingSource,
  f2x: Float64Array,
  expressionF2x: number,
  co2Scale: Float64Array | null,
  fixedCo2Scale: number,
  out: Float64Array,
  lo = 0,
  hi = out.length,
): Float64Array {
  for (let m = lo; m < hi; m++) {
    const scale = co2Scale ? co2Scale[m]! : fixedCo2Scale;
    out[m] = scale * (source === "concentration" ? expressionF2x : f2x[m]!);
  }
  return out;
}
