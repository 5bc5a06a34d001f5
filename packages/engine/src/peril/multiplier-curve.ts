import { quantileOf, validateDistribution } from "../distributions/index.js";
import { perKelvinMultiplier } from "./per-kelvin-multiplier.js";
import { tableMultiplierAt } from "./table-multiplier.js";
import { tablesOf } from "./table-profile.js";
import type { PerilProfile } from "./types.js";

export interface MultiplierCurve {
  warming: number[];
  /** Per percentile key ("p5", …): the multiplier at each warming level (a table profile: its most frequent table's). */
  bands: Record<string, number[]>;
  /** Table profiles: each table's multiplier at each warming level, by the event return period it states. */
  tables?: { returnPeriod: number; multiplier: number[] }[];
}

/**
 * Multiplier against warming for a profile's preview (no climate ensemble: warming is
 * given), with the percentile bands of the scaling uncertainty alone.
 *
 * Method: exact, no sampling. For a per-kelvin profile the multiplier (1 + r)^x, with
 * x = warming − baselineWarming, is increasing in r when x > 0 and decreasing when x < 0,
 * so its p-th percentile is (1 + F⁻¹(p))^x for x > 0 and (1 + F⁻¹(1 − p))^x for x < 0
 * (percentiles commute with monotone maps); at x = 0 it is 1. A table has no scaling
 * uncertainty: every band is the most frequent table's multiplier, and `tables` gives every
 * table's curve by its return period. Cost O(levels × (percentiles + tables)).
 *
 * Example: rate fixed 0.07, baseline 1, levels [1, 2] → bands.p50 = [1, 1.07].
 */
export function perilMultiplierCurve(
  profile: Pick<PerilProfile, "scaling" | "baselineWarming">,
  warmingLevels: readonly number[],
  percentiles: readonly number[],
): MultiplierCurve {
  percentiles.forEach((p, i) => {
    if (!(p > 0 && p < 100)) throw new RangeError(`percentiles[${i}] must lie strictly between 0 and 100`);
  });
  warmingLevels.forEach((w, i) => {
    if (!Number.isFinite(w)) throw new RangeError(`warmingLevels[${i}] must be finite`);
  });
  const bands: Record<string, number[]> = {};
  const scaling = profile.scaling;
  if (scaling.kind === "table") {
    const tables = tablesOf(scaling).map((t) => {
      const table = tableMultiplierAt(t.points, scaling.beyondTable, profile.baselineWarming);
      return { returnPeriod: t.returnPeriod, multiplier: warmingLevels.map(table) };
    });
    for (const p of percentiles) bands[`p${p}`] = tables[0]!.multiplier.slice();
    return { warming: warmingLevels.slice(), bands, tables };
  }
  validateDistribution(scaling.rate, "scaling.rate");
  for (const p of percentiles) {
    const rising = quantileOf(scaling.rate, p / 100);
    const falling = quantileOf(scaling.rate, 1 - p / 100);
    bands[`p${p}`] = warmingLevels.map((w) => {
      const x = w - profile.baselineWarming;
      return perKelvinMultiplier(x >= 0 ? rising : falling, w, profile.baselineWarming);
    });
  }
  return { warming: warmingLevels.slice(), bands };
}
