import type { ClimateInput } from "./agents.js";
import type { Distribution } from "./distribution.js";

/**
 * The published default assumptions, in one place: where a new model version starts in the web
 * editor, what the demo seed's versions assume, and the presets the editor offers. Each value
 * names its source and says how sure it is; the ocean-layer spreads are our illustrative choice.
 */

/** ECS: IPCC AR6 WGI SPM A.4.4 best estimate 3 K, “very likely range” 2–5 K, read as 5th–95th percentiles. */
export const AR6_ECS_VERY_LIKELY: Distribution = { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" };

/** ECS: IPCC AR6 WGI SPM A.4.4 best estimate 3 K, “likely range” 2.5–4 K, read as 17th–83rd percentiles. */
export const AR6_ECS_LIKELY: Distribution = { type: "range", p50: 3, low: 2.5, high: 4, coverage: 66, shape: "lognormal" };

/** ERF of doubled CO2: IPCC AR6 WGI Ch. 7 Section 7.3.2.1, 3.93 ± 0.47 W m-2, read as 5th–95th percentiles. */
export const AR6_F2X: Distribution = { type: "range", p50: 3.93, low: 3.46, high: 4.4, coverage: 90, shape: "split-normal" };

/**
 * Two-layer ocean: centres near the CMIP5 multi-model means of Geoffroy et al. 2013a (C ≈ 7.3,
 * C0 ≈ 106 W yr m-2 K-1, γ ≈ 0.73 W m-2 K-1) and the Part II efficacy ≈ 1.28 (2013b), both from
 * memory; the spreads and bounds are illustrative, not a fit.
 */
export const ILLUSTRATIVE_OCEAN: Record<Exclude<ClimateInput, "ecs" | "f2x">, Distribution> = {
  upperHeatCapacity: { type: "truncated-normal", mean: 7.3, sd: 1.5, min: 3, max: 12 },
  deepHeatCapacity: { type: "truncated-normal", mean: 106, sd: 30, min: 40, max: 200 },
  heatExchange: { type: "truncated-normal", mean: 0.73, sd: 0.15, min: 0.3, max: 1.2 },
  deepEfficacy: { type: "triangular", min: 1, mode: 1.28, max: 1.6 },
};

/** The climate block a model version starts from: AR6 ECS and F2x, the illustrative ocean. */
export const DEFAULT_CLIMATE: Record<ClimateInput, Distribution> = { ecs: AR6_ECS_VERY_LIKELY, f2x: AR6_F2X, ...ILLUSTRATIVE_OCEAN };

/** One line per default above: its value, its source and how sure it is, for a version's notes. */
export const DEFAULT_CLIMATE_NOTES = {
  ecs: "ECS: median 3 K, 5th–95th percentiles 2 to 5 K (IPCC 2021, AR6 WGI SPM A.4.4 and TS Section TS.3.2.1: “very likely range” 2 to 5 K), drawn from a split (two-piece) lognormal (log-spread below the median from the 5 % end, above it from the 95 % end, so its density jumps at the median), as AR6's range is not one lognormal; the shape is our choice.",
  f2x: "F2x (ERF of doubled CO2): 3.93 W m-2, ±0.47 read as a 5–95 % range (AR6 WGI Ch. 7 Section 7.3.2.1, quoted in a secondary copy; the Technical Summary prints 3.9 ± 0.5).",
  ocean:
    "Two-layer ocean: upper heat capacity ~7.3, deep ~106 W yr m-2 K-1, exchange ~0.73 W m-2 K-1 (CMIP5 multi-model means after Geoffroy et al. 2013a, from memory, not verified); deep-ocean efficacy 1 to 1.6 around ~1.28 (Geoffroy et al. 2013b, from memory). Spreads are our illustrative choice.",
} as const;

/** What a run reports unless its model version or the run says otherwise. */
export const DEFAULT_RUN_SETTINGS = {
  percentiles: [5, 17, 50, 83, 95],
  thresholds: [1.5, 2, 3],
  horizons: [2030, 2050, 2100],
  baseline: [1850, 1900],
} as const;

/** A fresh, mutable copy of the run settings (callers may edit what they get). */
export function defaultRunSettings(): { percentiles: number[]; thresholds: number[]; horizons: number[]; baseline: [number, number] } {
  const d = DEFAULT_RUN_SETTINGS;
  return { percentiles: [...d.percentiles], thresholds: [...d.thresholds], horizons: [...d.horizons], baseline: [d.baseline[0], d.baseline[1]] };
}
