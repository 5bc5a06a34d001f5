import type { CurveRange, PerilCurve, PerilProfile } from "@plumeline/contracts";
import { perilMultiplierCurve } from "@plumeline/engine";
import { badRequest } from "../../errors/app-error.js";

/**
 * Warming levels from `from` to `to` in steps of `step`, each rounded to 1e-9 K so 0.1-K steps
 * print as 0.3 and not 0.30000000000000004; `to` itself is included when the steps reach it.
 */
export function warmingLevels(range: Pick<CurveRange, "from" | "to" | "step">): number[] {
  const count = Math.floor((range.to - range.from) / range.step + 1e-9) + 1;
  return Array.from({ length: count }, (_, i) => Math.round((range.from + i * range.step) * 1e9) / 1e9);
}

/**
 * The preview curve of a profile: the engine's exact multiplier percentiles at each warming
 * level (perilMultiplierCurve — no sampling, so the same profile always draws the same curve).
 * An engine refusal (a RangeError naming the field) becomes a 400 on `profile.<field>`.
 */
export function perilCurve(profile: Pick<PerilProfile, "scaling" | "baselineWarming" | "metric">, range: CurveRange): PerilCurve {
  try {
    const curve = perilMultiplierCurve(profile, warmingLevels(range), range.percentiles);
    return { ...curve, percentiles: [...range.percentiles], baselineWarming: profile.baselineWarming, metric: profile.metric };
  } catch (error) {
    if (error instanceof RangeError) {
      const space = error.message.indexOf(" ");
      throw badRequest([{ path: `profile.${error.message.slice(0, space)}`, message: error.message.slice(space + 1) }]);
    }
    throw error;
  }
}
