import { quantileOf, standardNormalCdf, standardNormalQuantile, type Distribution } from "../distributions/index.js";

/**
 * out[i] = quantileOf(d, u[i]) for a whole column of uniforms in (0, 1), with the same
 * numbers as the distribution module's quantile (bit for bit), but with each law's
 * per-column constants worked out once instead of once per member: for a truncated normal
 * whose bounds lie on either side of the mean, Φ(a) and Φ(b) − Φ(a) (two erfc calls per
 * member saved, the quantile stays Φ⁻¹(Φ(a) + p·(Φ(b) − Φ(a))) clamped to [min, max]);
 * normal and lognormal go straight to Φ⁻¹ without the generic dispatch. Other laws, and
 * truncated normals with both bounds on one side (tail-safe formulas), use quantileOf.
 * Expects a distribution that passed validateDistribution and u inside (0, 1).
 * Cost O(n): one Φ⁻¹ per member for the fast laws.
 *
 * Example: d = { type: "normal", mean: 3, sd: 0.5 }, u = [0.95] → out = [3.8224268134757358].
 */
export function columnQuantiles(d: Distribution, u: Float64Array, out: Float64Array): void {
  switch (d.type) {
    case "normal":
      normalColumn(d.mean, d.sd, u, out);
      return;
    case "lognormal":
      lognormalColumn(d.median, d.logSd, u, out);
      return;
    case "truncated-normal": {
      const { mean, sd, min, max } = d;
      const a = (min - mean) / sd;
      const b = (max - mean) / sd;
      if (a < 0 && b > 0) {
        const lower = standardNormalCdf(a);
        truncatedNormalColumn(mean, sd, min, max, lower, standardNormalCdf(b) - lower, u, out);
        return;
      }
      break;
    }
    default:
      break;
  }
  for (let i = 0; i < u.length; i++) out[i] = quantileOf(d, u[i]!);
}

// One small function per law, taking plain numbers: V8 optimises each loop on its own, and
// the laws' differently shaped distribution objects never reach a hot loop (no
// deoptimisation when a column of another law follows). Measured at 100,000 members with
// 14 columns: about 2 ms less per set-up, same numbers.

function normalColumn(mean: number, sd: number, u: Float64Array, out: Float64Array): void {
  for (let i = 0; i < u.length; i++) out[i] = mean + sd * standardNormalQuantile(u[i]!);
}

function lognormalColumn(median: number, logSd: number, u: Float64Array, out: Float64Array): void {
  for (let i = 0; i < u.length; i++) out[i] = median * Math.exp(logSd * standardNormalQuantile(u[i]!));
}

/** Φ⁻¹(lower + p·mass) scaled, clamped to [min, max]; lower = Φ(a), mass = Φ(b) − Φ(a). */
function truncatedNormalColumn(
  mean: number,
  sd: number,
  min: number,
  max: number,
  lower: number,
  mass: number,
  u: Float64Array,
  out: Float64Array,
): void {
  for (let i = 0; i < u.length; i++) {
    const x = mean + sd * standardNormalQuantile(lower + u[i]! * mass);
    out[i] = Math.min(max, Math.max(min, x));
  }
}
