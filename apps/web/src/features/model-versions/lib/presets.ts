import { AR6_ECS_LIKELY, AR6_ECS_VERY_LIKELY, AR6_F2X, type Distribution } from "@plumeline/contracts";

/**
 * Assessed ranges offered as one-click presets, each with its source. Labels name a range by
 * its percentiles; the assessment's own likelihood term appears only inside “…” quotation marks,
 * with its citation, in the source line (IPCC AR6 WGI SPM A.4.4, TS Section TS.3.2.1, Ch. 7
 * Section 7.3.2.1). The range fits are the editor's "from a range" construction (a split,
 * two-piece law), not the assessment's own shape.
 */
export const PRESETS: Record<string, Array<{ label: string; source: string; value: Distribution }>> = {
  ecs: [
    {
      label: "AR6: 3 K, 5th–95th pct 2–5 K",
      source: 'IPCC AR6 WG1 SPM A.4.4 (IPCC 2021): best estimate 3 K, “very likely range” 2–5 K, read as 5th–95th percentiles; split (two-piece) lognormal fit',
      value: AR6_ECS_VERY_LIKELY,
    },
    {
      label: "AR6: 3 K, 17th–83rd pct 2.5–4 K",
      source: 'IPCC AR6 WG1 SPM A.4.4 (IPCC 2021): best estimate 3 K, “likely range” 2.5–4 K, read as 17th–83rd percentiles; split (two-piece) lognormal fit',
      value: AR6_ECS_LIKELY,
    },
  ],
  f2x: [
    {
      label: "AR6: 3.93 ± 0.47 W m-2",
      source: "IPCC AR6 WGI Ch. 7 Section 7.3.2.1 (Forster et al. 2021): 3.93 ± 0.47 W m-2, read as 5th–95th percentiles; split (two-piece) normal fit",
      value: AR6_F2X,
    },
    { label: "5.35 ln 2 = 3.71 W m-2 (fixed)", source: "Myhre et al. 1998 logarithmic CO2 expression", value: { type: "fixed", value: 3.7083 } },
  ],
};
