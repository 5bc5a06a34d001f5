import type { TablePoint } from "./types.js";

/**
 * Value of a scaling table at a warming level. Inside the table: straight lines between
 * neighbouring points (linear in warming). Outside it: "hold" keeps the end point's value;
 * "extrapolate" continues the end segment at its constant per-kelvin rate, i.e.
 * m_end · (m_end / m_next)^((w − w_end) / (w_end − w_next)), which stays positive.
 * Points must have strictly increasing warming and positive multipliers (checked).
 * Cost O(points).
 *
 * Example: tableValue([{warming: 1, multiplier: 2}, {warming: 2, multiplier: 4}], "hold", 1.5) → 3.
 */
export function tableValue(points: readonly TablePoint[], beyondTable: "hold" | "extrapolate", warming: number): number {
  checkTable(points, beyondTable);
  return valueOfCheckedTable(points, beyondTable, warming);
}

function valueOfCheckedTable(points: readonly TablePoint[], beyondTable: "hold" | "extrapolate", warming: number): number {
  if (typeof warming !== "number" || !Number.isFinite(warming)) throw new RangeError("warming must be a finite number");
  const first = points[0]!;
  const last = points[points.length - 1]!;
  if (warming <= first.warming) return beyond(first, points[1]!, beyondTable, warming);
  if (warming >= last.warming) return beyond(last, points[points.length - 2]!, beyondTable, warming);
  let i = 1;
  while (points[i]!.warming < warming) i++;
  const lo = points[i - 1]!;
  const hi = points[i]!;
  const share = (warming - lo.warming) / (hi.warming - lo.warming);
  return lo.multiplier + share * (hi.multiplier - lo.multiplier);
}

/**
 * Multiplier of a table profile relative to the baseline risk view: the table's value at
 * the warming divided by its value at the baseline warming (exactly 1 there).
 * Example: points (0, 1), (1, 2.8), baseline 0, warming 1 → 2.8.
 */
export function tableMultiplier(
  points: readonly TablePoint[],
  beyondTable: "hold" | "extrapolate",
  warming: number,
  baselineWarming: number,
): number {
  return tableMultiplierAt(points, beyondTable, baselineWarming)(warming);
}

/**
 * The same multiplier as a function of warming, with the table checked once: for applying
 * one table to every member. Cost O(points) to build, O(points) per call.
 */
export function tableMultiplierAt(
  points: readonly TablePoint[],
  beyondTable: "hold" | "extrapolate",
  baselineWarming: number,
): (warming: number) => number {
  checkTable(points, beyondTable);
  if (typeof baselineWarming !== "number" || !Number.isFinite(baselineWarming))
    throw new RangeError("baselineWarming must be a finite number");
  const atBaseline = valueOfCheckedTable(points, beyondTable, baselineWarming);
  return (warming) => valueOfCheckedTable(points, beyondTable, warming) / atBaseline;
}

function beyond(end: TablePoint, next: TablePoint, rule: "hold" | "extrapolate", warming: number): number {
  if (rule === "hold" || warming === end.warming) return end.multiplier;
  const perKelvinFactor = Math.pow(end.multiplier / next.multiplier, 1 / (end.warming - next.warming));
  return end.multiplier * Math.pow(perKelvinFactor, warming - end.warming);
}

/** Throws a RangeError naming the first bad point (the engine's guard; contracts check the same). */
export function checkTable(points: readonly TablePoint[], beyondTable: string): void {
  // Checked as `unknown`: Array.isArray on the typed parameter would narrow it to any[].
  const list: unknown = points;
  if (!Array.isArray(list) || points.length < 2) throw new RangeError("points must hold at least two points");
  if (beyondTable !== "hold" && beyondTable !== "extrapolate") throw new RangeError('beyondTable must be "hold" or "extrapolate"');
  points.forEach((p, i) => {
    if (typeof p.warming !== "number" || !Number.isFinite(p.warming)) throw new RangeError(`points[${i}].warming must be a finite number`);
    if (typeof p.multiplier !== "number" || !Number.isFinite(p.multiplier) || p.multiplier <= 0)
      throw new RangeError(`points[${i}].multiplier must be a finite number > 0`);
    if (i > 0 && !(p.warming > points[i - 1]!.warming))
      throw new RangeError(`points[${i}].warming must be greater than points[${i - 1}].warming: warming levels must strictly increase`);
  });
}
