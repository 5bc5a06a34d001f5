import { describe, expect, it } from "vitest";
import { gasForcingSeries } from "./gas-forcing.js";
import { AR6_1750_CONCENTRATIONS } from "./reference-concentrations.js";

describe("gasForcingSeries", () => {
  // 1750 and 2019 concentrations, AR6 WGI TS Section TS.2.2 (1750 = 2019 minus the increase since 1750).
  const pathway = { co2: [278.3, 409.9], ch4: [729.2, 1866.3], n2o: [270.1, 332.1] };

  it("is zero at the AR6 1750 reference (278.3 / 729.2 / 270.1, AR6 TS Section TS.2.2)", () => {
    expect(AR6_1750_CONCENTRATIONS).toEqual({ co2: 278.3, ch4: 729.2, n2o: 270.1 });
    for (const expression of ["ar6", "etminan-2016", "myhre-1998"] as const)
      for (const gas of ["co2", "ch4", "n2o"] as const) expect(gasForcingSeries(expression, gas, pathway, 1)[0]).toBeCloseTo(0, 14);
  });

  it("reproduces the AR6 1750–2019 ERFs 2.16 / 0.54 / 0.21 with the ar6 expression (AR6 TS Section TS.2.2)", () => {
    expect(gasForcingSeries("ar6", "co2", pathway, 2)[1]).toBeCloseTo(2.16, 2);
    expect(gasForcingSeries("ar6", "ch4", pathway, 2)[1]).toBeCloseTo(0.54, 2);
    expect(gasForcingSeries("ar6", "n2o", pathway, 2)[1]).toBeCloseTo(0.21, 2);
  });

  it("gives 5.35·ln(409.9/278.3) = 2.072 for CO2 with myhre-1998 (computed from Myhre et al. 1998)", () => {
    expect(gasForcingSeries("myhre-1998", "co2", { co2: [278.3, 409.9] }, 2)[1]).toBeCloseTo(2.072, 3);
  });

  it("holds an absent gas at its 1750 value in the overlap terms", () => {
    const withReferenceN2o = gasForcingSeries("etminan-2016", "co2", { co2: [409.9], n2o: [270.1] }, 1);
    const withoutN2o = gasForcingSeries("etminan-2016", "co2", { co2: [409.9] }, 1);
    expect(withoutN2o[0]).toBe(withReferenceN2o[0]);
    // …and the overlap matters when N2O is present and raised.
    expect(gasForcingSeries("etminan-2016", "co2", { co2: [409.9], n2o: [332.1] }, 1)[0]).not.toBe(withoutN2o[0]);
  });

  it("names the gas and the year index of a bad concentration", () => {
    expect(() => gasForcingSeries("ar6", "co2", { co2: [278.3, 0] }, 2)).toThrow(
      new RangeError("concentrations.co2[1] must be a finite number > 0"),
    );
    expect(() => gasForcingSeries("ar6", "co2", { co2: [300], n2o: [-1] }, 1)).toThrow("concentrations.n2o[0] must be a finite number > 0");
    expect(() => gasForcingSeries("ar6", "ch4", { co2: [300] }, 1)).toThrow("concentrations.ch4 is required for ch4 forcing");
    expect(() => gasForcingSeries("ar6", "co2", { co2: [300] }, 2)).toThrow("concentrations.co2 has 1 values; 2 are needed");
    expect(() => gasForcingSeries("hansen" as "ar6", "co2", { co2: [300] }, 1)).toThrow(/expression must be one of/);
  });
});
