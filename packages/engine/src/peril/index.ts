export type {
  PerilMetric,
  PerKelvinScaling,
  TablePoint,
  ReturnPeriodTable,
  BeyondTableShare,
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
export { multiplierAtReturnPeriod, lossReturnPeriodAfterScaling, type BeyondReturnPeriods } from "./return-period-multiplier.js";
export { tablesOf, tableProfileReader, LEGACY_TABLE_RETURN_PERIOD, type TableProfileReader } from "./table-profile.js";
export { shiftedReturnPeriod, BASELINE_RETURN_PERIODS } from "./return-periods.js";
export {
  lossAtReturnPeriod,
  projectRow,
  projectRowAcrossReturnPeriods,
  type TailLosses,
  type ProjectedFigures,
  type ReturnPeriodMultipliers,
} from "./project-losses.js";
export { sampleRates } from "./sample-rates.js";
export { summariseValues } from "./summarise-values.js";
export { applyPerilLens, matchingRows, shareBeyond, type PerilLensInput } from "./apply-peril-lens.js";
export { planPortfolioTotals, PortfolioTotalsAccumulator, type TotalsPlan } from "./portfolio-totals.js";
export { assemblePerilResult } from "./assemble-peril-result.js";
export { perilMultiplierCurve, type MultiplierCurve } from "./multiplier-curve.js";
export { validatePerilInputs, BASELINE_WARMING_RANGE } from "./validate-peril-inputs.js";
