import { PROPAGATOR_TERMS, twoLayerPropagator, twoLayerPropagatorInto } from "../climate/two-layer-propagator.js";
import { SpecError } from "../spec/spec-error.js";
import type { Allocate } from "./sample-inputs.js";

/**
 * Per member, the one-year propagator of the two-layer model (Held et al. 2010; Geoffroy
 * et al. 2013a,b) as flat arrays, plus what the imbalance needs: N = F − λT − (ε−1)γ(T − T0).
 * Struct of arrays so the yearly loop streams through memory.
 *
 * The feedback parameter comes from the forcing this member itself feels at doubled CO2:
 * λ = F2x_felt / ECS with F2x_felt = scale_co2 · F2x (doubling-forcing.ts), so the member's
 * equilibrium warming for doubled CO2 is exactly its sampled ECS.
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
  /** The year's mean state from its start (two-layer-propagator.ts m11 …): with r, annual means. */
  m11: Float64Array;
  m12: Float64Array;
  m21: Float64Array;
  m22: Float64Array;
  lambda: Float64Array;
  /** (ε − 1)·γ: the extra heat uptake term of the imbalance with efficacy. */
  extraUptake: Float64Array;
  ecs: Float64Array;
  /** The forcing this member feels at doubled CO2 (W m-2): scale_co2 · F2x. */
  doublingForcing: Float64Array;
}

export interface ClimateColumns {
  ecs: Float64Array;
  /** Per member, scale_co2 · F2x (doubling-forcing.ts). */
  doublingForcing: Float64Array;
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

/** A sampled input behind the climate columns, with the field a refusal names. */
export interface ClimateInputColumn {
  field: string;
  values: Float64Array;
}

/**
 * Refuses a member climate that fillMemberClimate could not fill cleanly, in a fixed
 * order: the first non-positive input (by column of `inputs`, then by member), then the
 * first member whose propagator is not finite. Call it only when some fill returned false:
 * the two passes over every column are then worth their cost.
 */
export function refuseMemberClimate(columns: ClimateColumns, inputs: ClimateInputColumn[], out: MemberClimate): void {
  for (const input of inputs) requirePositiveSamples(input.values, input.field);
  checkMemberPropagators(columns, out);
}

/** A member climate's arrays, not yet filled (fillMemberClimate fills them). */
export function allocateMemberClimate(ecs: Float64Array, doublingForcing: Float64Array, allocate: Allocate): MemberClimate {
  const n = ecs.length;
  return {
    a11: allocate(n),
    a12: allocate(n),
    a21: allocate(n),
    a22: allocate(n),
    b1: allocate(n),
    b2: allocate(n),
    r1: allocate(n),
    r2: allocate(n),
    m11: allocate(n),
    m12: allocate(n),
    m21: allocate(n),
    m22: allocate(n),
    lambda: allocate(n),
    extraUptake: allocate(n),
    ecs,
    doublingForcing,
  };
}

function checkMemberPropagators(columns: ClimateColumns, out: MemberClimate): void {
  const n = out.a11.length;
  const { a11, a12, a21, a22, b1, b2, r1, r2, m11, m12, m21, m22 } = out;
  for (let m = 0; m < n; m++) {
    const lambda = columns.doublingForcing[m]! / columns.ecs[m]!;
    // fillMemberClimate skipped this member: twoLayerPropagator words the refusal.
    if (!isPositive(lambda)) twoLayerPropagator(propagatorInputs(columns, m, lambda));
    const finite =
      Number.isFinite(a11[m]!) && Number.isFinite(a12[m]!) && Number.isFinite(a21[m]!) && Number.isFinite(a22[m]!) &&
      Number.isFinite(b1[m]!) && Number.isFinite(b2[m]!) && Number.isFinite(r1[m]!) && Number.isFinite(r2[m]!) &&
      Number.isFinite(m11[m]!) && Number.isFinite(m12[m]!) && Number.isFinite(m21[m]!) && Number.isFinite(m22[m]!);
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
 * Builds members [lo, hi) of the propagators (cost O(members), a few exponentials each).
 * Members are independent, so ranges may be filled in any order, on any thread. Never throws: a member with a non-positive or
 * non-finite input or λ is left as it is (refuseMemberClimate refuses it). Returns true
 * when no member was left out and every term written is finite, i.e. when the checks
 * would pass; they run after the loop, so the loop stays small.
 */
export function fillMemberClimate(columns: ClimateColumns, out: MemberClimate, lo: number, hi: number): boolean {
  const { ecs: ecsColumn, doublingForcing: doublingColumn, upperHeatCapacity: cColumn, deepHeatCapacity: c0Column, heatExchange: gammaColumn, deepEfficacy: epsilonColumn } = columns;
  const { a11, a12, a21, a22, b1, b2, r1, r2, m11, m12, m21, m22, lambda: lambdaColumn, extraUptake } = out;
  const terms = new Float64Array(PROPAGATOR_TERMS);
  let skipped = false;
  // Sum of v − v over every term: 0 while all are finite, NaN for good once one is not
  // (∞ − ∞ and NaN − NaN are NaN), so finiteness costs one add per term, no branch.
  let notFinite = 0;
  for (let m = lo; m < hi; m++) {
    const ecs = ecsColumn[m]!;
    const doubling = doublingColumn[m]!;
    const upperHeatCapacity = cColumn[m]!;
    const deepHeatCapacity = c0Column[m]!;
    const heatExchange = gammaColumn[m]!;
    const deepEfficacy = epsilonColumn[m]!;
    const lambda = doubling / ecs;
    if (!(isPositive(ecs) && isPositive(doubling) && isPositive(upperHeatCapacity) && isPositive(deepHeatCapacity) && isPositive(heatExchange) && isPositive(deepEfficacy) && isPositive(lambda))) {
      skipped = true;
      continue;
    }
    twoLayerPropagatorInto(lambda, upperHeatCapacity, deepHeatCapacity, heatExchange, deepEfficacy, terms);
    const t0 = terms[0]!;
    const t1 = terms[1]!;
    const t2 = terms[2]!;
    const t3 = terms[3]!;
    const t4 = terms[4]!;
    const t5 = terms[5]!;
    const t6 = terms[6]!;
    const t7 = terms[7]!;
    const t8 = terms[8]!;
    const t9 = terms[9]!;
    const t10 = terms[10]!;
    const t11 = terms[11]!;
    a11[m] = t0;
    a12[m] = t1;
    a21[m] = t2;
    a22[m] = t3;
    b1[m] = t4;
    b2[m] = t5;
    r1[m] = t6;
    r2[m] = t7;
    m11[m] = t8;
    m12[m] = t9;
    m21[m] = t10;
    m22[m] = t11;
    notFinite += t0 - t0 + (t1 - t1) + (t2 - t2) + (t3 - t3) + (t4 - t4) + (t5 - t5) + (t6 - t6) + (t7 - t7);
    notFinite += t8 - t8 + (t9 - t9) + (t10 - t10) + (t11 - t11);
    lambdaColumn[m] = lambda;
    extraUptake[m] = (deepEfficacy - 1) * heatExchange;
  }
  return !skipped && notFinite === 0;
}

const isPositive = (v: number) => v > 0 && Number.isFinite(v);
