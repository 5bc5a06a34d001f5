export type { Distribution } from "./types.js";
export type { RangeFit } from "./range.js";
export { standardNormalCdf, standardNormalDensity, standardNormalQuantile, standardNormalSurvival } from "./normal.js";
export { erfc } from "./erfc.js";
export { fitRange } from "./range.js";
export { cdfOf, densityOf, quantileOf, quantilesOf, sampleOf } from "./evaluate-distribution.js";
export { validateDistribution } from "./validate-distribution.js";
export { summarizeDistribution } from "./summarize-distribution.js";
export { densityCurve } from "./density-curve.js";
