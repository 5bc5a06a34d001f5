import { perKelvinMultiplier } from "./per-kelvin-multiplier.js";
import { multiplierAtReturnPeriod } from "./return-period-multiplier.js";
import { tableProfileReader } from "./table-profile.js";
import type { PerilProfile } from "./types.js";

/**
 * Hazard or loss multiplier of a peril profile at a warming level (K above 1850–1900),
 * relative to the firm's baseline risk view (which already holds `baselineWarming`).
 * per-kelvin: (1 + rate)^(warming − baselineWarming), with the member's sampled rate;
 * table: each table's value at warming / its value at baselineWarming (rate is ignored), read
 * at `returnPeriod` between the tables (multiplierAtReturnPeriod); without a return period,
 * the most frequent table's. Cost O(1) per-kelvin, O(points) table.
 *
 * Example: perilMultiplier({ baselineWarming: 1, scaling: { kind: "per-kelvin", … } }, 3, 0.07) → 1.07² = 1.1449.
 */
export function perilMultiplier(
  profile: Pick<PerilProfile, "scaling" | "baselineWarming">,
  warming: number,
  rate?: number,
  returnPeriod?: number,
): number {
  const { scaling, baselineWarming } = profile;
  if (scaling.kind === "per-kelvin") {
    if (rate === undefined) throw new RangeError("rate is needed for a per-kelvin profile");
    return perKelvinMultiplier(rate, warming, baselineWarming);
  }
  const reader = tableProfileReader(scaling, baselineWarming);
  const multipliers = new Float64Array(reader.returnPeriods.length);
  reader.multipliersAt(warming, multipliers);
  if (returnPeriod === undefined) return multipliers[0]!;
  return multiplierAtReturnPeriod(reader.returnPeriods, multipliers, scaling.beyondReturnPeriods ?? "hold", returnPeriod);
}
