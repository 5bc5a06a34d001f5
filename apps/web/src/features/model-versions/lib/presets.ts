import type { Distribution } from "@plumeline/contracts";

/**
 * Assessed ranges offered as one-click presets, each with its source (IPCC AR6 WGI SPM A.4.4,
 * TS Section TS.3.2.1, Ch. 7 Section 7.3.2.1).
 * The range fits are the editor's "from a range" construction, not the assessment's own shape.
 */
export const PRESETS: Record<string, Array<{ label: string; source: string; value: Distribution }>> = {
  ecs: [
    {
      label: "AR6: 3 K, very likely 2–5 K",
      source: "IPCC AR6 WGI SPM A.4.4 (5–95 %), lognormal fit",
      value: { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" },
    },
    {
      label: "AR6: 3 K, likely 2.5–4 K",
      source: "IPCC AR6 WGI SPM A.4.4 (17–83 %), lognormal fit",
      value: { type: "range", p50: 3, low: 2.5, high: 4, coverage: 66, shape: "lognormal" },
    },
  ],
  f2x: [
    {
      label: "AR6: 3.93 ± 0.47 W m-2",
      source: "IPCC AR6 WGI Ch. 7 Section 7.3.2.1, ±0.47 read as a 5–95 % range",
      value: { type: "range", p50: 3.93, low: 3.46, high: 4.4, coverage: 90, shape: "split-normal" },
    },
    { label: "5.35 ln 2 = 3.71 W m-2 (fixed)", source: "Myhre et al. 1998 logarithmic CO2 expression", value: { type: "fixed", value: 3.7083 } },
  ],
};
