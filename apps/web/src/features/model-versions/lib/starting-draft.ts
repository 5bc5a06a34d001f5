import type { ModelDraft } from "./model-draft-form";

/**
 * Where a version with no parent starts: assessed ranges with their sources (IPCC AR6
 * WGI SPM A.4.4, Ch. 7 Section 7.3.2.1; the values the demo seed cites). Ocean-layer spreads are illustrative.
 */
export const STARTING_DRAFT: ModelDraft = {
  name: "",
  parentId: null,
  notes: [
    "ECS: median 3 K, 5–95 % 2–5 K (IPCC AR6 WGI SPM A.4.4), lognormal fit.",
    "F2x: 3.93 W m-2 with ±0.47 read as 5–95 % (AR6 WGI Ch. 7 Section 7.3.2.1).",
    "Two-layer ocean parameters: CMIP5 multi-model means after Geoffroy et al. 2013a,b (illustrative spreads).",
  ].join("\n"),
  model: {
    climate: {
      ecs: { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" },
      f2x: { type: "range", p50: 3.93, low: 3.46, high: 4.4, coverage: 90, shape: "split-normal" },
      upperHeatCapacity: { type: "truncated-normal", mean: 7.3, sd: 1.5, min: 3, max: 12 },
      deepHeatCapacity: { type: "truncated-normal", mean: 106, sd: 30, min: 40, max: 200 },
      heatExchange: { type: "truncated-normal", mean: 0.73, sd: 0.15, min: 0.3, max: 1.2 },
      deepEfficacy: { type: "triangular", min: 1, mode: 1.28, max: 1.6 },
    },
    agents: {},
    correlations: [],
    constraint: null,
    forcingExpression: "ar6",
  },
  defaults: { percentiles: [5, 17, 50, 83, 95], thresholds: [1.5, 2, 3], horizons: [2030, 2050, 2100], baseline: [1850, 1900] },
};
