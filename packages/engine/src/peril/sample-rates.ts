import { quantilesOf, type Distribution } from "../distributions/index.js";
import { createRandom, deriveSeed } from "../random/create-random.js";
import { latinHypercube, monteCarloUniforms } from "../sampling/index.js";

/**
 * Each member's per-kelvin rate for one peril profile, drawn from the profile's own seeded
 * stream (seed / "peril:<profileId>"), so the draws do not depend on the runner's streams,
 * on other profiles or on the pathway: a member keeps its rate across pathways and horizons.
 *
 * Method: one column of plain Monte Carlo uniforms or of a Latin hypercube (McKay et al.
 * 1979), from the sampling module with the profile's stream; then r_i = F⁻¹(u_i) by the
 * distribution's quantile function.
 * Cost O(n).
 *
 * Example: sampleRates({ type: "fixed", value: 0.07 }, 3, "s", "flood", "monte-carlo") → [0.07, 0.07, 0.07].
 */
export function sampleRates(
  rate: Distribution,
  members: number,
  seed: string,
  profileId: string,
  sampling: "latin-hypercube" | "monte-carlo",
  name = "rate",
): Float64Array {
  if (!Number.isInteger(members) || members < 1) throw new RangeError("members must be a whole number ≥ 1");
  const random = createRandom(deriveSeed(seed, `peril:${profileId}`));
  let u: Float64Array;
  if (sampling === "monte-carlo") u = monteCarloUniforms(members, 1, random)[0]!;
  else if (sampling === "latin-hypercube") u = latinHypercube(members, 1, random)[0]!;
  else throw new RangeError('sampling must be "latin-hypercube" or "monte-carlo"');
  return quantilesOf(rate, u, name, u);
}
