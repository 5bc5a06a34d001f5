import { twoLayerPropagator } from "../climate/two-layer-propagator.js";
import { SpecError } from "../spec/spec-error.js";
import type { Allocate } from "./sample-inputs.js";

/**
 * Per member, the one-year propagator of the two-layer model (Held et al. 2010; Geoffroy
 * et al. 2013a,b) as flat arrays, plus what the imbalance needs: N = F − λT − (ε−1)γ(T − T0).
 * Struct of arrays so the yearly loop streams through memory.
 */
export interface MemberClimate {
  a11: Float64Array;
  a12: Float64Array;
  a21: Float64Array;
  a22: Float64Array;
  b1: Float64Array;
  b2: Float64Array;
  /** Response to a forcing rising linearly through the year (used for TCR). */
  r1: Float64Array;
  r2: Float64Array;
  lambda: Float64Array;
  /** (ε − 1)·γ: the extra heat uptake term of the imbalance with efficacy. */
  extraUptake: Float64Array;
  ecs: Float64Array;
  f2x: Float64Array;
}

export interface ClimateColumns {
  ecs: Float64Array;
  f2x: Float64Array;
  upperHeatCapacity: Float64Array;
  deepHeatCapacity: Float64Array;
  heatExchange: Float64Array;
  deepEfficacy: Float64Array;
}

/** Members' physical inputs must be positive; a sampled value that is not is refused, naming the member (1-based). */
function requirePositiveSamples(column: Float64Array, field: string): void {
  for (let m = 0; m < column.length; m++) {
    const v = column[m]!;
    if (!(v > 0) || !Number.isFinite(v))
      throw new SpecError(
        field,
        `sampled a non-positive value at member ${m + 1} (${v}): use a truncated or lognormal distribution`,
      );
  }
}

/** Builds every member's propagator. Cost O(members), a few exponentials each. */
export function buildMemberClimate(columns: ClimateColumns, allocate: Allocate): MemberClimate {
  const n = columns.ecs.length;
  for (const [name, column] of Object.entries(columns)) requirePositiveSamples(column, `model.climate.${name}`);
  const out: MemberClimate = {
    a11: allocate(n),
    a12: allocate(n),
    a21: allocate(n),
    a22: allocate(n),
    b1: allocate(n),
    b2: allocate(n),
    r1: allocate(n),
    r2: allocate(n),
    lambda: allocate(n),
    extraUptake: allocate(n),
    ecs: columns.ecs,
    f2x: columns.f2x,
  };
  for (let m = 0; m < n; m++) {
    const lambda = columns.f2x[m]! / columns.ecs[m]!;
    const p = twoLayerPropagator({
      lambda,
      upperHeatCapacity: columns.upperHeatCapacity[m]!,
      deepHeatCapacity: columns.deepHeatCapacity[m]!,
      heatExchange: columns.heatExchange[m]!,
      deepEfficacy: columns.deepEfficacy[m]!,
    });
    if (![p.a11, p.a12, p.a21, p.a22, p.b1, p.b2, p.r1, p.r2].every(Number.isFinite))
      throw new SpecError(
        "model.climate",
        `gives member ${m + 1} a climate whose one-year response is not finite (λ = ${lambda}): narrow the input distributions`,
      );
    out.a11[m] = p.a11;
    out.a12[m] = p.a12;
    out.a21[m] = p.a21;
    out.a22[m] = p.a22;
    out.b1[m] = p.b1;
    out.b2[m] = p.b2;
    out.r1[m] = p.r1;
    out.r2[m] = p.r2;
    out.lambda[m] = lambda;
    out.extraUptake[m] = (columns.deepEfficacy[m]! - 1) * columns.heatExchange[m]!;
  }
  return out;
}
