/**
 * Multiplicative per-degree scaling: multiplier = (1 + rate)^(warming − baselineWarming).
 * `rate` is a fraction per K (0.07 = 7 % per K, the Clausius–Clapeyron figure for heavy
 * rainfall, AR6 SPM B.2.4) and must exceed −1; warming and baselineWarming are K above
 * 1850–1900. Below the baseline warming the multiplier falls below 1 by the same law.
 * Cost O(1).
 *
 * Example: perKelvinMultiplier(0.07, 2.1, 1.1) → 1.07.
 */
export function perKelvinMultiplier(rate: number, warming: number, baselineWarming: number): number {
  if (typeof rate !== "number" || !Number.isFinite(rate) || rate <= -1)
    throw new RangeError("rate must be a finite number > -1 (a fraction per K)");
  if (typeof warming !== "number" || !Number.isFinite(warming)) throw new RangeError("warming must be a finite number");
  if (typeof baselineWarming !== "number" || !Number.isFinite(baselineWarming))
    throw new RangeError("baselineWarming must be a finite number");
  return Math.pow(1 + rate, warming - baselineWarming);
}
