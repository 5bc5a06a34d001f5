import type { MemberClimate } from "./member-climate.js";
import type { Allocate } from "./sample-inputs.js";

/**
 * What the yearly step reads and writes for one member, packed side by side in one
 * Float64Array (array of structs): one base pointer and one bounds check serve a member's
 * whole update, and its 96 bytes share one or two cache lines. With a dozen separate arrays
 * V8 ran out of registers in the step loop and reloaded array bases and lengths on every
 * member (about twice as slow, measured).
 */
export const RECORD = 12;
export const A11 = 0;
export const A12 = 1;
export const A21 = 2;
export const A22 = 3;
export const B1 = 4;
export const B2 = 5;
export const LAMBDA = 6;
/** (ε − 1)·γ, the extra heat uptake term of the imbalance. */
export const EXTRA_UPTAKE = 7;
/** Sum, then mean, of the member's upper-layer temperature over the baseline period. */
export const BASELINE = 8;
export const UPPER = 9;
export const DEEP = 10;
/** The lowest ascending threshold the member has not crossed yet (+Infinity once all are). */
export const NEXT_THRESHOLD = 11;

/** Packs each member's propagator and imbalance terms; state fields start at 0. Cost O(members). */
export function buildMemberRecords(climate: MemberClimate, members: number, allocate: Allocate): Float64Array {
  const records = allocate(members * RECORD);
  const { a11, a12, a21, a22, b1, b2, lambda, extraUptake } = climate;
  for (let m = 0; m < members; m++) {
    const o = m * RECORD;
    records[o + A11] = a11[m]!;
    records[o + A12] = a12[m]!;
    records[o + A21] = a21[m]!;
    records[o + A22] = a22[m]!;
    records[o + B1] = b1[m]!;
    records[o + B2] = b2[m]!;
    records[o + LAMBDA] = lambda[m]!;
    records[o + EXTRA_UPTAKE] = extraUptake[m]!;
  }
  return records;
}
