import { quantilesOf, type Distribution } from "../distributions/index.js";
import { createRandom, deriveSeed } from "../random/create-random.js";

/**
 * Each member's per-kelvin rate for one peril profile, drawn from the profile's own seeded
 * stream (seed / "peril:<profileId>"), so the draws do not depend on the runner's streams,
 * on other profiles or on the pathway: a member keeps its rate across pathways and horizons.
 *
 * Method: plain Monte Carlo (u_i uniform) or a Latin-hypercube column (McKay et al. 1979):
 * u_i = (π_i + v_i) / n with π a Fisher–Yates permutation of 0..n−1 and v_i uniform, both
 * from the same stream; then r_i = F⁻¹(u_i) by the distribution's quantile function.
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
  const u = new Float64Array(members);
  if (sampling === "monte-carlo") {
    for (let i = 0; i < members; i++) u[i] = random();
  } else if (sampling === "latin-hypercube") {
    const strata = new Uint32Array(members);
    for (let i = 0; i < members; i++) strata[i] = i;
    for (let i = members - 1; i > 0; i--) {
      const j = Math.floor(random() * (i + 1));
      const t = strata[i]!;
      strata[i] = strata[j]!;
      strata[j] = t;
    }
    for (let i = 0; i < members; i++) u[i] = (strata[i]! + random()) / members;
  } else throw new RangeError('sampling must be "latin-hypercube" or "monte-carlo"');
  return quantilesOf(rate, u, name, u);
}
