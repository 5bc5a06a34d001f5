import { ch4ErfAr6, co2ErfAr6, n2oErfAr6 } from "./ar6.js";
import { ch4ForcingEtminan, co2ForcingEtminan, n2oForcingEtminan } from "./etminan-2016.js";
import { ch4ForcingTar, co2ForcingMyhre, n2oForcingTar } from "./myhre-1998.js";
import { AR6_1750_CONCENTRATIONS } from "./reference-concentrations.js";

/** The published expressions that turn a concentration pathway into forcing. */
export type ForcingExpression = "ar6" | "etminan-2016" | "myhre-1998";
export type ForcingGas = "co2" | "ch4" | "n2o";
export interface GasConcentrations {
  /** CO2 in ppm, one value per year. */
  co2?: ArrayLike<number>;
  /** CH4 in ppb, one value per year. */
  ch4?: ArrayLike<number>;
  /** N2O in ppb, one value per year. */
  n2o?: ArrayLike<number>;
}

const EXPRESSIONS: readonly ForcingExpression[] = ["ar6", "etminan-2016", "myhre-1998"];
const GASES: readonly ForcingGas[] = ["co2", "ch4", "n2o"];

/**
 * Forcing (W m⁻²) of one gas, per year, relative to the AR6 1750 reference state
 * (278.3 ppm CO2, 729.2 ppb CH4, 270.1 ppb N2O; reference-concentrations.ts).
 *
 * Method, per year t, with the other gases at their year-t values for the overlap terms
 * (a gas absent from `concentrations` is held at its 1750 value):
 * * "ar6": Meinshausen et al. (2020) SARF × AR6 adjustment (CO2 1.05, CH4 0.86, N2O 1.07),
 *   taken as F(state_t) − F(state_1750) — an ERF;
 * * "etminan-2016": Etminan et al. (2016) with the bars the means of year t and 1750;
 * * "myhre-1998": 5.35·ln(C/C0) and the TAR CH4/N2O expressions (overlap at 1750 values).
 * The Etminan and Myhre/TAR expressions are stratospheric-adjusted RF, used as ERF with no
 * adjustment factor (AR5 practice for the well-mixed gases).
 * Validity ranges of the fits (Etminan: CO2 180–2000 ppm, CH4 340–3500 ppb, N2O 200–525 ppb
 * from memory) are documented, not enforced. A concentration that is not finite or ≤ 0 throws
 * a RangeError naming the gas and the year index. Cost O(length).
 * Reference: Myhre et al. (1998); Etminan et al. (2016); Meinshausen et al. (2020) as used in
 * IPCC AR6 WGI Ch. 7 Section 7.3.2; reference concentrations from AR6 TS Section TS.2.2.
 *
 * Example: `gasForcingSeries("myhre-1998", "co2", { co2: [278.3, 556.6] }, 2)` →
 * Float64Array [0, 3.7083].
 */
export function gasForcingSeries(
  expression: ForcingExpression,
  gas: ForcingGas,
  concentrations: GasConcentrations,
  length: number,
): Float64Array {
  if (!EXPRESSIONS.includes(expression)) throw new RangeError(`expression must be one of ${EXPRESSIONS.map((e) => `"${e}"`).join(", ")}`);
  if (!GASES.includes(gas)) throw new RangeError('gas must be one of "co2", "ch4", "n2o"');
  if (!Number.isInteger(length) || length < 0) throw new RangeError("length must be an integer ≥ 0");
  if (concentrations === null || typeof concentrations !== "object") throw new RangeError("concentrations must be an object");
  if (concentrations[gas] === undefined) throw new RangeError(`concentrations.${gas} is required for ${gas} forcing`);
  for (const other of GASES) {
    const series = concentrations[other];
    if (series !== undefined && series.length < length)
      throw new RangeError(`concentrations.${other} has ${series.length} values; ${length} are needed`);
  }

  const reference = AR6_1750_CONCENTRATIONS;
  const at = (which: ForcingGas, year: number): number => {
    const series = concentrations[which];
    if (series === undefined) return reference[which];
    const value = series[year]!;
    if (typeof value !== "number" || !Number.isFinite(value) || !(value > 0))
      throw new RangeError(`concentrations.${which}[${year}] must be a finite number > 0`);
    return value;
  };

  const out = new Float64Array(length);
  for (let year = 0; year < length; year++) {
    const c = at("co2", year);
    const m = at("ch4", year);
    const n = at("n2o", year);
    out[year] = forcingOfGas(expression, gas, c, m, n);
  }
  return out;
}

function forcingOfGas(expression: ForcingExpression, gas: ForcingGas, c: number, m: number, n: number): number {
  const ref = AR6_1750_CONCENTRATIONS;
  switch (expression) {
    case "ar6":
      if (gas === "co2") return co2ErfAr6(c, ref.co2, n, ref.n2o);
      if (gas === "ch4") return ch4ErfAr6(m, ref.ch4, n, ref.n2o);
      return n2oErfAr6(n, ref.n2o, c, m, ref.co2, ref.ch4);
    case "etminan-2016":
      if (gas === "co2") return co2ForcingEtminan(c, ref.co2, (n + ref.n2o) / 2);
      if (gas === "ch4") return ch4ForcingEtminan(m, ref.ch4, (n + ref.n2o) / 2);
      return n2oForcingEtminan(n, ref.n2o, (c + ref.co2) / 2, (m + ref.ch4) / 2);
    case "myhre-1998":
      if (gas === "co2") return co2ForcingMyhre(c, ref.co2);
      if (gas === "ch4") return ch4ForcingTar(m, ref.ch4, ref.n2o);
      return n2oForcingTar(n, ref.n2o, ref.ch4);
  }
}
