import { DEFAULT_CLIMATE, DEFAULT_CLIMATE_NOTES, defaultRunSettings, type CreateModelVersionBody } from "@plumeline/contracts";

/**
 * Demo model versions: AR6-based defaults, each with its source in the notes (and how sure
 * the value is, in plain words). ILLUSTRATIVE: the ocean-layer parameters are not a fit.
 *
 * v1 is the approved one: the prior below constrained by the observed 2011–2020 warming, so
 * it reproduces the observed decade (its approval comment states the numbers, checked by
 * demo-approved-warming.test.ts). v2 is a draft trial of the same prior constrained by the
 * 2001–2020 observations instead.
 */
export interface DemoModelVersion {
  key: "harbourline-core-v1" | "harbourline-core-v2-trial-2001-2020";
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

const PRIOR_NOTES = [
  "ILLUSTRATIVE demo assumptions for Harbourline Mutual (invented insurer). Sources, with how sure each value is:",
  `- ${DEFAULT_CLIMATE_NOTES.ecs}`,
  `- ${DEFAULT_CLIMATE_NOTES.f2x}`,
  "- Forcing scale factors: 5–95 % ranges of AR6 WGI Ch. 7 Table 7.8 (Forster et al. 2021; 2019 vs 1750) divided by their central values — CO2 2.16 [1.90–2.41], CH4 0.54 [0.43–0.65], N2O 0.21 [0.18–0.24], halogenated 0.41 [0.33–0.49], ozone 0.47 [0.24–0.71], aerosol–radiation −0.22 [−0.47 to +0.04], aerosol–cloud −0.84 [−1.45 to −0.25], land use −0.20 [−0.30 to −0.10]. The central values for CO2–ozone and land use are printed in the AR6 Technical Summary; the ranges for CO2/CH4/N2O/halogens and the aerosol split were read in secondary copies of the table.",
  "- Other (stratospheric water vapour from CH4 0.05 [0.00–0.10], light-absorbing particles on snow and ice 0.08 [0.00–0.18], contrails and aviation-induced cirrus 0.06 [0.02–0.10]; Table 7.8 rows from memory): 0.19 W m-2, range 0.088–0.309 from adding the three half-widths in quadrature (independent parts). With it the 2019 total anthropogenic ERF is AR6's 2.72 [1.96 to 3.48] W m-2 (SPM A.4.1).",
  `- ${DEFAULT_CLIMATE_NOTES.ocean}`,
  "- No input correlations.",
].join("\n");

/** Gaussian stand-in for a 5–95 % range: its width over 2 × 1.645 (the normal's 95th percentile). */
const sdOf90Range = (low: number, high: number) => Math.round(((high - low) / (2 * 1.6448536269514722)) * 1000) / 1000;

/**
 * Internal variability of a decade's mean warming, 1 sd in K: IPCC AR6 WGI SPM A.1.3 gives
 * internal variability's contribution to 2010–2019 warming as −0.2 to +0.2 °C (likely), read as
 * a 17–83 % normal range, 0.2 / 0.954 = 0.21 K (the engine's default, stated here so the notes
 * and the spec say the same).
 */
const DECADE_INTERNAL_VARIABILITY = 0.21;

/** AR6 WGI SPM A.1.2: observed GMST 2011–2020 vs 1850–1900, 1.09 [0.95 to 1.20] K. */
const OBSERVED_2011_2020 = { from: 2011, to: 2020, observed: 1.09, sd: sdOf90Range(0.95, 1.2), internalVariability: DECADE_INTERNAL_VARIABILITY };
/** AR6 WGI SPM A.1.2: observed GMST 2001–2020 vs 1850–1900, 0.99 [0.84 to 1.10] K. */
const OBSERVED_2001_2020 = { from: 2001, to: 2020, observed: 0.99, sd: sdOf90Range(0.84, 1.1), internalVariability: DECADE_INTERNAL_VARIABILITY };

const NOTES_V1 =
  PRIOR_NOTES +
  `\n- Observational constraint: members weighted by how well their 2011–2020 mean warming matches the observed 1.09 K [0.95–1.20] over 1850–1900 (IPCC AR6 WGI SPM A.1.2, 5–95 %); observational sd ${OBSERVED_2011_2020.sd} K = (1.20 − 0.95) / (2 × 1.645), and internal variability of the decade's mean ${DECADE_INTERNAL_VARIABILITY} K (AR6 WGI SPM A.1.3: −0.2 to +0.2 °C likely, read as 17–83 %), added in quadrature: the constrained forced warming is therefore wider than the observed range.`;

const NOTES_V2 =
  PRIOR_NOTES +
  `\n- Trial observational constraint: the 2001–2020 mean instead, observed 0.99 K [0.84–1.10] over 1850–1900 (IPCC AR6 WGI SPM A.1.2, 5–95 %); observational sd ${OBSERVED_2001_2020.sd} K = (1.10 − 0.84) / (2 × 1.645), internal variability ${DECADE_INTERNAL_VARIABILITY} K as in v1. Draft: for comparison with v1, not approved.`;

const agents = {
  co2: { scale: scaleFromRange(2.16, 1.9, 2.41) },
  ch4: { scale: scaleFromRange(0.54, 0.43, 0.65) },
  n2o: { scale: scaleFromRange(0.21, 0.18, 0.24) },
  "other-wmghg": { scale: scaleFromRange(0.41, 0.33, 0.49) },
  ozone: { scale: scaleFromRange(0.47, 0.24, 0.71) },
  "aerosol-radiation": { scale: scaleFromRange(-0.22, -0.47, 0.04) },
  "aerosol-cloud": { scale: scaleFromRange(-0.84, -1.45, -0.25) },
  "land-use": { scale: scaleFromRange(-0.2, -0.3, -0.1) },
  // Stratospheric water vapour 0.05 [0.00–0.10] + particles on snow and ice 0.08 [0.00–0.18] +
  // contrails and cirrus 0.06 [0.02–0.10] (AR6 Table 7.8, from memory): independent parts,
  // half-widths added in quadrature below and above the summed centre -> 0.19 [0.088–0.309].
  other: { scale: scaleFromRange(0.19, 0.19 - Math.hypot(0.05, 0.08, 0.04), 0.19 + Math.hypot(0.05, 0.1, 0.04)) },
};

const defaults = defaultRunSettings();
const allPathways = ["harbourline-low", "harbourline-middle", "harbourline-high", "harbourline-middle-gases"];

/**
 * What the approved version reproduces, as its approval comment states it: 2019 total
 * anthropogenic ERF as sampled (before and after the constraint's weights) and 2011–2020 warming
 * (weighted 5/50/95 %), measured with the engine (version and members below, Latin hypercube) on
 * the Harbourline Middle pathway (the same as the other pathways up to 2019) and checked in
 * demo-approved-warming.test.ts.
 */
export const APPROVED_REPRODUCES = {
  engineVersion: "0.3.0",
  members: 5000,
  erf2019: { p5: 1.95, p50: 2.72, p95: 3.5 },
  erf2019Weighted: { p5: 2.11, p50: 2.71, p95: 3.37 },
  warming2011to2020: { p5: 0.8, p17: 0.91, p50: 1.08, p83: 1.25, p95: 1.38 },
} as const;

const f2 = (v: number) => v.toFixed(2);
const APPROVAL_COMMENT =
  `Approved for the illustrative scenario set. Checked before approval: 2019 total anthropogenic ERF ` +
  `${f2(APPROVED_REPRODUCES.erf2019.p50)} [${f2(APPROVED_REPRODUCES.erf2019.p5)} to ${f2(APPROVED_REPRODUCES.erf2019.p95)}] W m-2 ` +
  `as sampled (AR6: 2.72 [1.96 to 3.48]), ${f2(APPROVED_REPRODUCES.erf2019Weighted.p50)} [${f2(APPROVED_REPRODUCES.erf2019Weighted.p5)} to ` +
  `${f2(APPROVED_REPRODUCES.erf2019Weighted.p95)}] after the constraint's weights; 2011–2020 warming with the observational constraint ` +
  `${f2(APPROVED_REPRODUCES.warming2011to2020.p50)} [${f2(APPROVED_REPRODUCES.warming2011to2020.p5)}–${f2(APPROVED_REPRODUCES.warming2011to2020.p95)}] K, 5–95 % ` +
  `(observed: 1.09 [0.95–1.20]): the median matches; the range is wider than the observed one because the constraint allows ` +
  `${DECADE_INTERNAL_VARIABILITY} K of internal variability in a decade's mean, and its 17–83 % ` +
  `${f2(APPROVED_REPRODUCES.warming2011to2020.p17)}–${f2(APPROVED_REPRODUCES.warming2011to2020.p83)} K lies inside AR6's likely human-induced ` +
  `2010–2019 warming of 0.8–1.3 K (SPM A.1.3); engine ${APPROVED_REPRODUCES.engineVersion}, ${APPROVED_REPRODUCES.members.toLocaleString("en-GB")} members. The ocean parameters are illustrative, not a fit; sources and their standing are in the notes.`;

export const demoModelVersions: readonly DemoModelVersion[] = [
  {
    key: "harbourline-core-v1",
    author: "analyst",
    approve: { by: "manager", changeClass: "major", comment: APPROVAL_COMMENT },
    body: {
      name: "Harbourline Core Assumptions",
      notes: NOTES_V1,
      model: { climate: DEFAULT_CLIMATE, agents, correlations: [], constraint: OBSERVED_2011_2020, forcingExpression: "ar6" },
      defaults,
      pathwayKeys: allPathways,
    },
  },
  {
    key: "harbourline-core-v2-trial-2001-2020",
    author: "analyst",
    approve: null,
    body: {
      name: "Harbourline Core Assumptions",
      notes: NOTES_V2,
      model: { climate: DEFAULT_CLIMATE, agents, correlations: [], constraint: OBSERVED_2001_2020, forcingExpression: "ar6" },
      defaults,
      pathwayKeys: allPathways,
    },
  },
];
