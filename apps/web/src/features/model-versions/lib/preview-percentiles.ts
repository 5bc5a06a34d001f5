import type { Distribution } from "@plumeline/contracts";
import { quantileOf } from "@plumeline/engine";

/** The percentiles the editor and the assumptions table show for every input. */
export const PREVIEW_PERCENTILES = [5, 17, 50, 83, 95] as const;

/** The 5/17/50/83/95 values of a distribution, by the engine's own quantile functions. */
export function percentileValues(d: Distribution): Array<{ p: number; value: number }> {
  return PREVIEW_PERCENTILES.map((p) => ({ p, value: quantileOf(d, p / 100) }));
}
