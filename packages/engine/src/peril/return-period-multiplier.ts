/**
 * How a table profile's multipliers, given for a few event return periods, are read at any
 * return period. Between tables the log multiplier is a straight line in log return period
 * (a power law m ∝ T^b between neighbours), which keeps the new return periods T / m(T) in
 * the tables' order whenever the tables themselves are (T_k / m_k increasing). Beyond the
 * tables: "hold" keeps the nearest table's multiplier; "extrapolate" continues the end
 * segment's power law. One table: its multiplier at every return period.
 */
export type BeyondReturnPeriods = "hold" | "extrapolate";

/**
 * Slope of ln m against ln T on the segment that holds u = ln T, and ln m at u.
 * `returnPeriods` strictly increasing, `multipliers` > 0, same length ≥ 1 (checked by callers).
 */
function logMultiplierAt(returnPeriods: readonly number[], multipliers: ArrayLike<number>, beyond: BeyondReturnPeriods, u: number): { value: number; slope: number } {
  const n = returnPeriods.length;
  if (n === 1) return { value: Math.log(multipliers[0]!), slope: 0 };
  const segment = (i: number) => {
    const u0 = Math.log(returnPeriods[i]!);
    const y0 = Math.log(multipliers[i]!);
    const slope = (Math.log(multipliers[i + 1]!) - y0) / (Math.log(returnPeriods[i + 1]!) - u0);
    return { u0, y0, slope };
  };
  const first = Math.log(returnPeriods[0]!);
  const last = Math.log(returnPeriods[n - 1]!);
  if (u <= first || u >= last) {
    const end = u <= first ? 0 : n - 1;
    if (beyond === "hold") return { value: Math.log(multipliers[end]!), slope: 0 };
    const s = segment(u <= first ? 0 : n - 2);
    return { value: Math.log(multipliers[end]!) + s.slope * (u - Math.log(returnPeriods[end]!)), slope: s.slope };
  }
  let i = 0;
  while (Math.log(returnPeriods[i + 1]!) < u) i++;
  const s = segment(i);
  return { value: s.y0 + s.slope * (u - s.u0), slope: s.slope };
}

/**
 * Multiplier of a 1-in-T event from the tables' multipliers at one warming level:
 * m(T) = m_k · (m_{k+1} / m_k)^(ln(T / T_k) / ln(T_{k+1} / T_k)) between tables k and k+1;
 * beyond them as `beyond` says. Cost O(tables).
 *
 * Example: returnPeriods [10, 50], multipliers [2.8, 4.8], T = √500 ≈ 22.36 → √(2.8 · 4.8) ≈ 3.666.
 */
export function multiplierAtReturnPeriod(
  returnPeriods: readonly number[],
  multipliers: ArrayLike<number>,
  beyond: BeyondReturnPeriods,
  returnPeriod: number,
): number {
  if (!(Number.isFinite(returnPeriod) && returnPeriod > 0)) throw new RangeError("returnPeriod must be a finite number > 0");
  const n = returnPeriods.length;
  if (n === 1) return multipliers[0]!;
  const u = Math.log(returnPeriod);
  // Exactly at a table's return period: its own multiplier, not a rounded exp(log).
  const k = returnPeriods.indexOf(returnPeriod);
  if (k >= 0) return multipliers[k]!;
  if (beyond === "hold" && u < Math.log(returnPeriods[0]!)) return multipliers[0]!;
  if (beyond === "hold" && u > Math.log(returnPeriods[n - 1]!)) return multipliers[n - 1]!;
  return Math.exp(logMultiplierAt(returnPeriods, multipliers, beyond, u).value);
}

/**
 * Baseline return period t of the loss level that has return period T once every loss level's
 * exceedance frequency is multiplied by its own event's multiplier: the smallest t ≥ 1 year
 * with t / m(t) ≥ T. In u = ln t the condition reads g(u) = u − ln m(e^u) ≥ ln T, and g is a
 * straight line between the tables' return periods (and beyond them), so the crossing is
 * found exactly, segment by segment. When every return period has the same multiplier m this
 * is t = T · m (returned as that product, to the last bit). Throws a RangeError when the
 * tables make rarer events at least as frequent as commoner ones for good (no loss level then
 * has return period T). Cost O(tables).
 *
 * Example: one table, m = 2 → lossReturnPeriodAfterScaling([10], [2], "hold", 100) = 200.
 */
export function lossReturnPeriodAfterScaling(
  returnPeriods: readonly number[],
  multipliers: ArrayLike<number>,
  beyond: BeyondReturnPeriods,
  returnPeriod: number,
): number {
  if (!(Number.isFinite(returnPeriod) && returnPeriod > 0)) throw new RangeError("returnPeriod must be a finite number > 0");
  if (allEqual(multipliers)) return returnPeriod * multipliers[0]!;
  const target = Math.log(returnPeriod);
  const g = (u: number) => u - logMultiplierAt(returnPeriods, multipliers, beyond, u).value;
  const knots = [0, ...returnPeriods.map(Math.log).filter((u) => u > 0)];
  if (g(0) >= target) return 1;
  for (let i = 0; i + 1 < knots.length; i++) {
    const a = knots[i]!;
    const b = knots[i + 1]!;
    const ga = g(a);
    const gb = g(b);
    if (gb >= target) return Math.exp(a + ((target - ga) * (b - a)) / (gb - ga));
  }
  const a = knots[knots.length - 1]!;
  const slope = 1 - logMultiplierAt(returnPeriods, multipliers, beyond, a + 1).slope;
  if (!(slope > 0))
    throw new RangeError(
      `returnPeriod ${returnPeriod}: beyond ${Math.round(Math.exp(a))} years the tables make rarer events at least as frequent as commoner ones, so no loss level has this return period; hold beyond the tables' return periods instead`,
    );
  return Math.exp(a + (target - g(a)) / slope);
}

/** True when every multiplier equals the first (one multiplier serves every return period). */
export function allEqual(multipliers: ArrayLike<number>): boolean {
  for (let k = 1; k < multipliers.length; k++) if (multipliers[k] !== multipliers[0]) return false;
  return true;
}
