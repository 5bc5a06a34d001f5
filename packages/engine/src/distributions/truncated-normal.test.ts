import { describe, expect, it } from "vitest";
import { cdfTruncatedNormal, densityTruncatedNormal, quantileTruncatedNormal } from "./truncated-normal.js";
import type { TruncatedNormalDistribution } from "./types.js";

function truncated(mean: number, sd: number, min: number, max: number): TruncatedNormalDistribution {
  return { type: "truncated-normal", mean, sd, min, max };
}

// Reference: SciPy 1.17 `truncnorm.ppf / cdf / pdf(·, a, b, loc=mean, scale=sd)` with
// a = (min − mean)/sd, b = (max − mean)/sd (computed); cdf and pdf at min + 0.3·(max − min).
const SCIPY_CASES: Array<{ d: TruncatedNormalDistribution; q: [number, number, number]; cdf: number; pdf: number }> = [
  { d: truncated(3, 1, 2, 6), q: [2.034132336136782, 3.198447899603447, 5.335837870954196], cdf: 0.5007226609670384, pdf: 0.4655298718668711 },
  { d: truncated(0, 1, 0, 10), q: [0.012533469508069276, 0.6744897501960817, 2.575829303548901], cdf: 0.9973002039367398, pdf: 0.00886369682387602 },
  { d: truncated(0, 1, 8, 9), q: [8.001237199059593, 8.08488889901817, 8.54670368112742], cdf: 0.9164883573602234, pdf: 0.7044626680377154 },
  { d: truncated(0, 1, -9, -8), q: [-8.54670368112742, -8.08488889901817, -8.001237199059593], cdf: 0.0024865012959897526, pdf: 0.02351022279739462 },
  { d: truncated(0, 1, 30, 31), q: [30.00033463833215, 30.023070467827313, 30.15294665858198], cdf: 0.9998831861081424, pdf: 0.0035433078158800596 },
  { d: truncated(1, 0.5, 0.2, 5), q: [0.23998333205501354, 1.0343674056548842, 2.173709192489804], cdf: 0.8939139940608584, pdf: 0.3720848466435291 },
];

describe("truncated normal", () => {
  it.each(SCIPY_CASES)("matches SciPy truncnorm for %o", ({ d, q, cdf, pdf }) => {
    [0.01, 0.5, 0.99].forEach((p, i) => expect(quantileTruncatedNormal(d, p)).toBeCloseTo(q[i]!, 10));
    const x = d.min + 0.3 * (d.max - d.min);
    expect(cdfTruncatedNormal(d, x)).toBeCloseTo(cdf, 10);
    expect(densityTruncatedNormal(d, x) / pdf).toBeCloseTo(1, 9);
  });

  it("stays finite, inside the bounds and monotone when both bounds are beyond 37 sd", () => {
    // Φ(−50) underflows; the exponential tail limit takes over (documented, error ~ 1/a²).
    for (const d of [truncated(0, 1, 50, 52), truncated(0, 1, -52, -50), truncated(0, 1, 1e3, 1e3 + 1e-3)]) {
      let previous = -Infinity;
      for (const p of [1e-12, 0.01, 0.3, 0.5, 0.9, 1 - 1e-12]) {
        const x = quantileTruncatedNormal(d, p);
        expect(Number.isFinite(x)).toBe(true);
        expect(x).toBeGreaterThanOrEqual(d.min);
        expect(x).toBeLessThanOrEqual(d.max);
        expect(x).toBeGreaterThanOrEqual(previous);
        previous = x;
        expect(cdfTruncatedNormal(d, x)).toBeCloseTo(p, 8);
        expect(Number.isFinite(densityTruncatedNormal(d, x))).toBe(true);
      }
    }
    // Exponential limit with rate a = 50: median ≈ 50 + ln 2/50 (within 1/a² relative of the truth).
    expect(quantileTruncatedNormal(truncated(0, 1, 50, 52), 0.5)).toBeCloseTo(50 + Math.LN2 / 50, 3);
  });

  it("is the plain normal when the bounds are far from the mass", () => {
    const d = truncated(3, 0.5, -100, 100);
    // mean + sd·Φ⁻¹(0.95), Φ⁻¹(0.95) = scipy.stats.norm.ppf(0.95) (SciPy 1.17).
    expect(quantileTruncatedNormal(d, 0.95)).toBeCloseTo(3 + 0.5 * 1.644853627, 9);
  });

  it("returns 0 density outside and CDF 0/1 at the bounds", () => {
    const d = truncated(0, 1, -1, 2);
    expect(densityTruncatedNormal(d, -1.5)).toBe(0);
    expect(cdfTruncatedNormal(d, -1)).toBe(0);
    expect(cdfTruncatedNormal(d, 2)).toBe(1);
  });
});
