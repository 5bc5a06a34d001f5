import { describe, expect, it } from "vitest";
import { ch4ErfAr6, ch4SarfAr6, co2ErfAr6, co2SarfAr6, n2oErfAr6, n2oSarfAr6 } from "./ar6.js";
import { ch4ForcingEtminan, co2ForcingEtminan, n2oForcingEtminan } from "./etminan-2016.js";
import { ch4ForcingTar, co2ForcingMyhre, n2oForcingTar } from "./myhre-1998.js";

describe("Myhre et al. 1998 / IPCC TAR expressions", () => {
  it("gives 5.35·ln 2 = 3.7083 W m⁻² for doubled CO2 (Myhre et al. 1998, quoted 3.71 in TAR)", () => {
    // F2x = 5.35 ln 2 = 3.7083, computed from the Myhre et al. 1998 expression; IPCC TAR WGI
    // p. 358 quotes 3.71 (seen only in a secondary source).
    expect(co2ForcingMyhre(556, 278)).toBeCloseTo(3.7083, 4);
    expect(co2ForcingMyhre(278, 278)).toBe(0);
    // Computed from the closed form with the AR6 TS Section TS.2.2 concentrations: 5.35 ln(409.9/278.3) = 2.072.
    expect(co2ForcingMyhre(409.9, 278.3)).toBeCloseTo(2.072, 3);
  });

  it("reproduces the TAR CH4 and N2O check values and AR5's 0.48 / 0.17 (IPCC TAR WGI Table 6.2)", () => {
    // Computed from the TAR expressions (written from memory): CH4 722→1803 (N0 = 270) → 0.492;
    // N2O 270→324 (M0 = 722) → 0.177. AR5 1750–2011: 0.48 and 0.17 (±0.015 as advised).
    expect(ch4ForcingTar(1803, 722, 270)).toBeCloseTo(0.492, 3);
    expect(n2oForcingTar(324, 270, 722)).toBeCloseTo(0.177, 3);
    expect(Math.abs(ch4ForcingTar(1803, 722, 270) - 0.48)).toBeLessThan(0.015);
    expect(Math.abs(n2oForcingTar(324, 270, 722) - 0.17)).toBeLessThan(0.015);
  });

  it("names the concentration that is not positive", () => {
    expect(() => co2ForcingMyhre(0, 278)).toThrow(new RangeError("c must be > 0"));
    expect(() => ch4ForcingTar(1803, -1, 270)).toThrow("m0 must be > 0");
    expect(() => n2oForcingTar(Number.NaN, 270, 722)).toThrow("n must be a finite number");
  });
});

describe("Etminan et al. 2016 expressions", () => {
  // Coefficients as quoted from Etminan et al. 2016 Table 1 by public codes, CO2 constant and form
  // from memory; check values computed from the expressions, and they reproduce the paper's abstract
  // (CH4 0.48 → 0.61 W m⁻²; CO2 within 1 % of AR5; about 10 % higher at 2000 ppm).
  it("gives 3.802 W m⁻² for 278 → 556 ppm with N = 270 ppb", () => {
    expect(co2ForcingEtminan(556, 278, 270)).toBeCloseTo(3.802, 3);
  });

  it("is within 1 % of AR5's 1.82 for 1750–2011 (278 → 390.5 ppm, N 270 → 324): 1.827", () => {
    const forcing = co2ForcingEtminan(390.5, 278, (270 + 324) / 2);
    expect(forcing).toBeCloseTo(1.827, 3);
    expect(Math.abs(forcing / 1.82 - 1)).toBeLessThan(0.01);
  });

  it("is about 9 % above 5.35·ln(C/C0) at 2000 ppm (11.51 vs 10.56)", () => {
    const etminan = co2ForcingEtminan(2000, 278, 270);
    expect(etminan).toBeCloseTo(11.51, 2);
    expect(etminan / co2ForcingMyhre(2000, 278)).toBeGreaterThan(1.08);
    expect(etminan / co2ForcingMyhre(2000, 278)).toBeLessThan(1.1);
  });

  it("gives CH4 0.607 (abstract: 0.61) and N2O 0.172 for 1750–2011", () => {
    expect(ch4ForcingEtminan(1803, 722, (270 + 324) / 2)).toBeCloseTo(0.607, 3);
    expect(n2oForcingEtminan(324, 270, (278 + 390.5) / 2, (722 + 1803) / 2)).toBeCloseTo(0.172, 3);
  });

  it("uses brackets linear in the mean concentrations, not their square roots (Etminan et al. 2016 form)", () => {
    // With √-means the CH4 value would be far from 0.61; the linear form gives 0.607.
    const nBar = (270 + 324) / 2;
    const sqrtForm = (-1.3e-6 * Math.sqrt((1803 + 722) / 2) + -8.2e-6 * Math.sqrt(nBar) + 0.043) * (Math.sqrt(1803) - Math.sqrt(722));
    expect(Math.abs(sqrtForm - 0.61)).toBeGreaterThan(0.02);
    expect(Math.abs(ch4ForcingEtminan(1803, 722, nBar) - 0.61)).toBeLessThan(0.005);
  });
});

describe("AR6 (Meinshausen et al. 2020 re-fit) with tropospheric adjustments", () => {
  // Coefficients of AR6 Table 7.SM.1 from memory, but they reproduce published AR6 headline numbers:
  // CO2 2.16, CH4 0.54, N2O 0.21 (AR6 WGI TS Section TS.2.2) and 3.93 for 2×CO2 (AR6 WGI Ch. 7
  // Section 7.3.2.1, seen in a secondary copy). 1750 = 278.3 / 729.2 / 270.1, 2019 = 409.9 / 1866.3 /
  // 332.1 (AR6 TS Section TS.2.2: 2019 values minus their increases since 1750).
  it("reproduces the AR6 1750–2019 ERFs 2.16 / 0.54 / 0.21 W m⁻²", () => {
    expect(co2ErfAr6(409.9, 278.3, 332.1, 270.1)).toBeCloseTo(2.16, 2);
    expect(ch4ErfAr6(1866.3, 729.2, 332.1, 270.1)).toBeCloseTo(0.54, 2);
    expect(n2oErfAr6(332.1, 270.1, 409.9, 1866.3, 278.3, 729.2)).toBeCloseTo(0.21, 2);
    // The SARFs behind them, computed from the expressions: 2.055, 0.633, 0.195.
    expect(co2SarfAr6(409.9, 278.3, 332.1, 270.1)).toBeCloseTo(2.055, 3);
    expect(ch4SarfAr6(1866.3, 729.2, 332.1, 270.1)).toBeCloseTo(0.633, 3);
    expect(n2oSarfAr6(332.1, 270.1, 409.9, 1866.3, 278.3, 729.2)).toBeCloseTo(0.195, 3);
  });

  it("gives 3.93 W m⁻² for doubling from the fit's 277.15 ppm (SARF 3.746 × 1.05)", () => {
    expect(co2SarfAr6(2 * 277.15, 277.15, 273.87)).toBeCloseTo(3.746, 3);
    expect(co2ErfAr6(2 * 277.15, 277.15, 273.87)).toBeCloseTo(3.93, 2);
  });

  it("differs from Etminan for 2×CO2 (3.75 vs 3.80 SARF, computed from both forms)", () => {
    expect(co2ForcingEtminan(556, 278, 270) - co2SarfAr6(556, 278, 270)).toBeGreaterThan(0.04);
  });

  it("holds α′ constant above ≈ 1808 ppm, so forcing keeps rising only logarithmically", () => {
    // Above C_αmax the bracket is constant: F(4000) − F(3000) = bracket·ln(4/3).
    const step = co2SarfAr6(4000, 3000, 273.87);
    const bracket = 5.2488 - 7.5906e-4 ** 2 / (4 * -2.4785e-7) - 2.1492e-3 * Math.sqrt(273.87);
    expect(step).toBeCloseTo(bracket * Math.log(4 / 3), 12);
  });
});
