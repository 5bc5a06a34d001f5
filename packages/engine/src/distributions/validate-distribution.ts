import { validateFixed } from "./fixed.js";
import { validateLognormal } from "./lognormal.js";
import { validateNormal } from "./normal.js";
import { validateRange } from "./range.js";
import { validateTriangular } from "./triangular.js";
import { validateTruncatedNormal } from "./truncated-normal.js";
import type { Distribution } from "./types.js";
import { validateUniform } from "./uniform.js";

const KNOWN_TYPES = '"fixed", "normal", "lognormal", "uniform", "triangular", "truncated-normal", "range"';

/**
 * Checks one distribution before it is sampled, so a bad parameter fails with a message that
 * names it (`${name}.sd must be > 0`) instead of turning into NaN deep inside a run.
 *
 * Rules: every parameter finite; sd, logSd and median > 0; max > min; min ≤ mode ≤ max;
 * low < p50 < high; coverage 90 or 66; low > 0 for a lognormal range. Cost O(1).
 *
 * Example: `validateDistribution({ type: "normal", mean: 3, sd: -1 }, "ecs")` throws
 * RangeError("ecs.sd must be > 0").
 */
export function validateDistribution(d: Distribution, name: string): void {
  if (d === null || typeof d !== "object") throw new RangeError(`${name} must be a distribution object`);
  switch (d.type) {
    case "fixed":
      { validateFixed(d, name); return; }
    case "normal":
      { validateNormal(d, name); return; }
    case "lognormal":
      { validateLognormal(d, name); return; }
    case "uniform":
      { validateUniform(d, name); return; }
    case "triangular":
      { validateTriangular(d, name); return; }
    case "truncated-normal":
      { validateTruncatedNormal(d, name); return; }
    case "range":
      { validateRange(d, name); return; }
    default:
      throw new RangeError(`${name}.type must be one of ${KNOWN_TYPES}`);
  }
}
