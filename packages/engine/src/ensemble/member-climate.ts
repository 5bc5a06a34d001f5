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

/**
 * Builds every member's propagator. Cost O(members), a few exponentials each. Refuses a
 * non-positive input (first by column, then by member) and then the first member whose
 * propagator is not finite (checked once all are built).
 */
export function buildMemberClimate(columns: ClimateColumns, allocate: Allocate, early?: EarlyMembers): MemberClimate {
  const out = allocateMemberClimate(columns, allocate);
  const n = out.ecs.length;
  const first = early ? Math.min(n, early.members) : 0;
  fillMemberClimate(columns, out, 0, first);
  early?.filled(out);
  fillMemberClimate(columns, out, first, n);
  checkClimateInputs(columns);
  checkMemberPropagators(columns, out);
  return out;
}

/**
 * Lets a caller use the first `members` members' propagators while the rest are built
 * (the parallel runner's workers warm their kernels on them): `filled` is called once
 * those are in place, before any member has been checked.
 */
export interface EarlyMembers {
  members: number;
  filled(climate: MemberClimate): void;
}

function allocateMemberClimate(columns: ClimateColumns, allocate: Allocate): MemberClimate {
  const n = columns.ecs.length;
  return {
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
}

function checkClimateInputs(columns: ClimateColumns): void {
  for (const [name, column] of Object.entries(columns)) requirePositiveSamples(column, `model.climate.${name}`);
}

function checkMemberPropagators(columns: ClimateColumns, out: MemberClimate): void {
  const n = out.a11.length;
  const { a11, a12, a21, a22, b1, b2, r1, r2 } = out;
  for (let m = 0; m < n; m++) {
    const lambda = columns.f2x[m]! / columns.ecs[m]!;
    // fillMemberClimate skipped this member: twoLayerPropagator gives the error it gives buildMemberClimate.
    if (!isPositive(lambda)) twoLayerPropagator(propagatorInputs(columns, m, lambda));
    const finite =
      Number.isFinite(a11[m]!) && Number.isFinite(a12[m]!) && Number.isFinite(a21[m]!) && Number.isFinite(a22[m]!) &&
      Number.isFinite(b1[m]!) && Number.isFinite(b2[m]!) && Number.isFinite(r1[m]!) && Number.isFinite(r2[m]!);
    if (!finite)
      throw new SpecError(
        "model.climate",
        `gives member ${m + 1} a climate whose one-year response is not finite (λ = ${lambda}): narrow the input distributions`,
      );
  }
}

function propagatorInputs(columns: ClimateColumns, m: number, lambda: number) {
  return {
    lambda,
    upperHeatCapacity: columns.upperHeatCapacity[m]!,
    deepHeatCapacity: columns.deepHeatCapacity[m]!,
    heatExchange: columns.heatExchange[m]!,
    deepEfficacy: columns.deepEfficacy[m]!,
  };
}

/**
 * Members [lo, hi) of the propagators. Never throws: a member with a non-positive or
 * non-finite input or λ is left as it is (checkMemberPropagators refuses it). The check
 * runs after the loop, as plain comparisons, so the loop stays small.
 */
function fillMemberClimate(columns: ClimateColumns, out: MemberClimate, lo: number, hi: number): void {
  for (let m = lo; m < hi; m++) {
    const ecs = columns.ecs[m]!;
    const f2x = columns.f2x[m]!;
    const upperHeatCapacity = columns.upperHeatCapacity[m]!;
    const deepHeatCapacity = columns.deepHeatCapacity[m]!;
    const heatExchange = columns.heatExchange[m]!;
    const deepEfficacy = columns.deepEfficacy[m]!;
    if (!(isPositive(ecs) && isPositive(f2x) && isPositive(upperHeatCapacity) && isPositive(deepHeatCapacity) && isPositive(heatExchange) && isPositive(deepEfficacy)))
      continue;
    const lambda = f2x / ecs;
    if (!isPositive(lambda)) continue;
    const p = twoLayerPropagator({ lambda, upperHeatCapacity, deepHeatCapacity, heatExchange, deepEfficacy });
    out.a11[m] = p.a11;
    out.a12[m] = p.a12;
    out.a21[m] = p.a21;
    out.a22[m] = p.a22;
    out.b1[m] = p.b1;
    out.b2[m] = p.b2;
    out.r1[m] = p.r1;
    out.r2[m] = p.r2;
    out.lambda[m] = lambda;
    out.extraUptake[m] = (deepEfficacy - 1) * heatExchange;
  }
}

const isPositive = (v: number) => v > 0 && Number.isFinite(v);
