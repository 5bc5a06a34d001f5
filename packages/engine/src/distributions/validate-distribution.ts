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
      return validateFixed(d, name);
    case "normal":
      return validateNormal(d, name);
    case "lognormal":
      return validateLognormal(d, name);
    case "uniform":
      return validateUniform(d, name);
    case "triangular":
      return validateTriangular(d, name);
    case "truncated-normal":
      return validateTruncatedNormal(d, name);
    case "range":
      return validateRange(d, name);
    default:
      throw new RangeError(`${name}.type must be one of ${KNOWN_TYPES}`);
  }
}
