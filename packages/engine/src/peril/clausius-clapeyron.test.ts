import { describe, expect, it } from "vitest";
import { clausiusClapeyronRate, saturationVapourPressure } from "./clausius-clapeyron.js";

describe("saturationVapourPressure (Magnus form)", () => {
  // Values computed from the Magnus form; coefficients Bolton (1980), Mon. Wea. Rev. 108, 1046–1053, and
  // Alduchov & Eskridge (1996), J. Appl. Meteor. 35(4), 601–609 (coefficients as quoted by public codes).
  it.each([
    [0, 6.112, 6.1094],
    [15, 17.0405, 17.0198],
    [25, 31.674, 31.617],
  ])("at %d °C: Bolton %f hPa, AE96 %f hPa", (t, bolton, ae96) => {
    expect(saturationVapourPressure(t, "bolton-1980")).toBeCloseTo(bolton, 3);
    expect(saturationVapourPressure(t, "alduchov-eskridge-1996")).toBeCloseTo(ae96, 3);
  });

  it("gives the finite-step ratios e_s(T+1)/e_s(T) of the Bolton (1980) fit", () => {
    // 1.0749 at 0 °C, 1.0662 at 15 °C, 1.0613 at 25 °C (computed from the Bolton 1980 formula).
    for (const [t, ratio] of [[0, 1.0749], [15, 1.0662], [25, 1.0613]] as const)
      expect(saturationVapourPressure(t + 1, "bolton-1980") / saturationVapourPressure(t, "bolton-1980")).toBeCloseTo(ratio, 4);
  });
});

describe("clausiusClapeyronRate", () => {
  // d ln e_s/dT 7.26/6.44/5.97 % (Bolton 1980), 7.25/6.43/5.96 % (Alduchov & Eskridge 1996), computed.
  it.each([
    [0, 0.0726, 0.0725],
    [15, 0.0644, 0.0643],
    [25, 0.0597, 0.0596],
  ])("at %d °C: Bolton %f, AE96 %f per K", (t, bolton, ae96) => {
    expect(clausiusClapeyronRate(t, "bolton-1980")).toBeCloseTo(bolton, 4);
    expect(clausiusClapeyronRate(t)).toBeCloseTo(ae96, 4);
  });

  it("agrees with the thermodynamic form L/(R_v T²) to within 0.15 %/K over 0–25 °C", () => {
    // Clausius–Clapeyron: with L = 2.501e6 J/kg, R_v = 461.5 J/(kg K) (constants from memory) the
    // rate is 7.26 % at 273.15 K, 6.53 % at 288.15 K, 6.10 % at 298.15 K (computed).
    const thermodynamic = (tK: number) => 2.501e6 / (461.5 * tK * tK);
    for (const t of [0, 5, 10, 15, 20, 25]) expect(Math.abs(clausiusClapeyronRate(t) - thermodynamic(t + 273.15))).toBeLessThan(0.0015);
  });

  it("lies between 6 % and 7.5 % per K over 0–25 °C, not exactly 7 % (the textbook 'about 7 %' is a rounding)", () => {
    for (let t = 0; t <= 25; t += 0.5)
      for (const form of ["alduchov-eskridge-1996", "bolton-1980"] as const) {
        const rate = clausiusClapeyronRate(t, form);
        expect(rate).toBeGreaterThan(0.059);
        expect(rate).toBeLessThan(0.075);
      }
    // The band is "about 6 % to 7.5 %" (computed rates above): at 25 °C both fits give 5.96–5.97 %, just under 6 %.
    expect(clausiusClapeyronRate(20)).toBeGreaterThan(0.06);
    expect(clausiusClapeyronRate(25)).toBeLessThan(0.06);
  });

  it("is the log-derivative of saturationVapourPressure (central difference)", () => {
    const h = 1e-4;
    for (const t of [0, 12.5, 25])
      expect(clausiusClapeyronRate(t)).toBeCloseTo(
        (Math.log(saturationVapourPressure(t + h)) - Math.log(saturationVapourPressure(t - h))) / (2 * h),
        8,
      );
  });

  it("rejects temperatures outside the Magnus fit and non-numbers, naming tempC", () => {
    expect(() => clausiusClapeyronRate(80)).toThrow(/tempC must lie between -40 and 50/);
    expect(() => clausiusClapeyronRate(Number.NaN)).toThrow(/tempC must be a finite number/);
  });
});
