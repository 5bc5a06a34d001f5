import type { CreateModelVersionBody } from "@plumeline/contracts";

/**
 * Demo model versions: AR6-based defaults, each with its source in the notes (CHECKS.md flags
 * in brackets). ILLUSTRATIVE: the ocean-layer parameters in particular are not a fit.
 */
export interface DemoModelVersion {
  key: "harbourline-core-v1" | "harbourline-core-v2-constrained";
  /** Demo user key of the author (an analyst); approval, when any, is by the first manager. */
  author: "analyst";
  approve: { by: "manager"; changeClass: "major" | "minor"; comment: string } | null;
  body: Omit<CreateModelVersionBody, "parentId" | "pathwayIds"> & { pathwayKeys: string[] };
}

/** Split-normal scale factor whose 5–95 % range is the AR6 range divided by the AR6 central value. */
function scaleFromRange(central: number, low: number, high: number) {
  // For a negative forcing the more negative end is the larger scale factor.
  const a = low / central;
  const b = high / central;
  return { type: "range" as const, p50: 1, low: round(Math.min(a, b)), high: round(Math.max(a, b)), coverage: 90 as const, shape: "split-normal" as const };
}
const round = (v: number) => Math.round(v * 1000) / 1000;

const NOTES_V1 = [
  "ILLUSTRATIVE demo assumptions for Harbourline Mutual (invented insurer). Sources, with how sure each value is:",
  "- ECS: median 3 K, 5th–95th percentiles 2 to 5 K (IPCC 2021, AR6 WG1 SPM A.4.4: best estimate 3 K, “very likely range” 2 to 5 K), fitted as a split (two-piece) lognormal: each half keeps the median and one end, so the density jumps at the median. AR6 gives no shape for its range; the fit is a choice.",
  "- F2x (ERF of doubled CO2): 3.93 W m-2, ±0.47 read as a 5–95 % range (AR6 §7.3.2.1 via a secondary copy; the TS rounds to 3.9 ± 0.5).",
  "- Forcing scale factors: 5–95 % ranges of AR6 Table 7.8 (2019 vs 1750) divided by their central values — CO2 2.16 [1.90–2.41], CH4 0.54 [0.43–0.65], N2O 0.21 [0.18–0.24], halogenated 0.41 [0.33–0.49], ozone 0.47 [0.24–0.71], aerosol–radiation −0.22 [−0.47 to +0.04], aerosol–cloud −0.84 [−1.45 to −0.25], land use −0.20 [−0.30 to −0.10]. Ranges for CO2/CH4/N2O/halogens/aerosol split are [read-S].",
  "- Two-layer ocean: upper heat capacity ~7.3, deep ~106 W yr m-2 K-1, exchange ~0.73 W m-2 K-1 (CMIP5 multi-model means after Geoffroy et al. 2013a, from memory, not verified); deep-ocean efficacy 1 to 1.6 around ~1.28 (Geoffroy et al. 2013b, from memory). Spreads are our illustrative choice.",
  "- No observational constraint, no input correlations.",
].join("\n");

const NOTES_V2 =
  NOTES_V1.replace("- No observational constraint, no input correlations.", "") +
  "- Observational constraint: GMST 2011–2020 vs 1850–1900 = 1.09 K (IPCC 2021, AR6 WG1 SPM A.1.2: “very likely range” 0.95 to 1.20 K); sd 0.076 K = (1.20 − 0.95) / (2 × 1.645), computed.\n" +
  "- No input correlations.";

const climate = {
  ecs: { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" },
  f2x: { type: "range", p50: 3.93, low: 3.46, high: 4.4, coverage: 90, shape: "split-normal" },
  upperHeatCapacity: { type: "truncated-normal", mean: 7.3, sd: 1.5, min: 3, max: 12 },
  deepHeatCapacity: { type: "truncated-normal", mean: 106, sd: 30, min: 40, max: 200 },
  heatExchange: { type: "truncated-normal", mean: 0.73, sd: 0.15, min: 0.3, max: 1.2 },
  deepEfficacy: { type: "triangular", min: 1, mode: 1.28, max: 1.6 },
} as const;

const agents = {
  co2: { scale: scaleFromRange(2.16, 1.9, 2.41) },
  ch4: { scale: scaleFromRange(0.54, 0.43, 0.65) },
  n2o: { scale: scaleFromRange(0.21, 0.18, 0.24) },
  "other-wmghg": { scale: scaleFromRange(0.41, 0.33, 0.49) },
  ozone: { scale: scaleFromRange(0.47, 0.24, 0.71) },
  "aerosol-radiation": { scale: scaleFromRange(-0.22, -0.47, 0.04) },
  "aerosol-cloud": { scale: scaleFromRange(-0.84, -1.45, -0.25) },
  "land-use": { scale: scaleFromRange(-0.2, -0.3, -0.1) },
};

const defaults = { percentiles: [5, 17, 50, 83, 95], thresholds: [1.5, 2, 3], horizons: [2030, 2050, 2100], baseline: [1850, 1900] as [number, number] };
const allPathways = ["harbourline-low", "harbourline-middle", "harbourline-high", "harbourline-middle-gases"];

export const demoModelVersions: readonly DemoModelVersion[] = [
  {
    key: "harbourline-core-v1",
    author: "analyst",
    approve: {
      by: "manager",
      changeClass: "major",
      comment: "Approved for the illustrative scenario set: AR6 ranges reproduced, sources cited in the notes.",
    },
    body: {
      name: "Harbourline Core Assumptions",
      notes: NOTES_V1,
      model: { climate, agents, correlations: [], constraint: null, forcingExpression: "ar6" },
      defaults,
      pathwayKeys: allPathways,
    },
  },
  {
    key: "harbourline-core-v2-constrained",
    author: "analyst",
    approve: null,
    body: {
      name: "Harbourline Core Assumptions",
      notes: NOTES_V2,
      model: { climate, agents, correlations: [], constraint: { from: 2011, to: 2020, observed: 1.09, sd: 0.076 }, forcingExpression: "ar6" },
      defaults,
      pathwayKeys: allPathways,
    },
  },
];
