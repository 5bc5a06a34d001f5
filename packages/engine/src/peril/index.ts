export type {
  PerilMetric,
  PerKelvinScaling,
  TablePoint,
  TableScaling,
  PerilScaling,
  PerilProfile,
  PortfolioRow,
  Portfolio,
  PerilSummary,
  ProjectedLoss,
  PerilHorizonResult,
  PerilProfileResult,
  PathwayPerilResult,
  PerilResult,
  PortfolioFigures,
  PortfolioTotal,
} from "./types.js";
export { clausiusClapeyronRate, saturationVapourPressure, MAGNUS_FORMS, type MagnusForm } from "./clausius-clapeyron.js";
export { perKelvinMultiplier } from "./per-kelvin-multiplier.js";
export { tableValue, tableMultiplier, tableMultiplierAt, checkTable } from "./table-multiplier.js";
export { perilMultiplier } from "./peril-multiplier.js";
export { shiftedReturnPeriod, BASELINE_RETURN_PERIODS } from "./return-periods.js";
export { lossAtReturnPeriod, projectRow, type TailLosses, type ProjectedFigures } from "./project-losses.js";
export { sampleRates } from "./sample-rates.js";
export { summariseValues } from "./summarise-values.js";
export { applyPerilLens, matchingRows, type PerilLensInput } from "./apply-peril-lens.js";
export { planPortfolioTotals, PortfolioTotalsAccumulator, type TotalsPlan } from "./portfolio-totals.js";
export { assemblePerilResult } from "./assemble-peril-result.js";
export { perilMultiplierCurve, type MultiplierCurve } from "./multiplier-curve.js";
export { validatePerilInputs, BASELINE_WARMING_RANGE } from "./validate-peril-inputs.js";
