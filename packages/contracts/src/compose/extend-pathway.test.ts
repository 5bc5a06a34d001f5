import { linearRegression, linearRegressionLine } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { extendPathway, linearTrendAhead } from "./extend-pathway.js";
import type { PathwayData } from "./pathway-data.js";

describe("extendPathway", () => {
  it("hold repeats each agent's last value up to the target year", () => {
    const p: PathwayData = { startYear: 2098, agents: { ozone: { erf: [0.4, 0.45, 0.5] }, co2: { ppm: [600, 610, 620] } } };
    const out = extendPathway(p, { kind: "extend", toYear: 2103, method: "hold" });
    expect(out.agents.ozone).toEqual({ erf: [0.4, 0.45, 0.5, 0.5, 0.5, 0.5] });
    expect(out.agents.co2).toEqual({ ppm: [600, 610, 620, 620, 620, 620] });
    expect(out.startYear).toBe(2098);
  });

  it("a linear trend continues an exactly linear series exactly (closed form y = 0.25·(year − 2090) − 1)", () => {
    // Quarter steps are exact in binary floating point, so the extension must match to the last bit.
    const line = (year: number) => 0.25 * (year - 2090) - 1;
    const years = Array.from({ length: 11 }, (_, i) => 2090 + i);
    const p: PathwayData = { startYear: 2090, agents: { other: { erf: years.map(line) }, solar: { erf: years.map(() => 0.125) } } };
    const out = extendPathway(p, { kind: "extend", toYear: 2150, method: "linear", fitYears: 5 });
    const all = Array.from({ length: 61 }, (_, i) => 2090 + i);
    expect(out.agents.other).toEqual({ erf: all.map(line) });
    expect(out.agents.solar).toEqual({ erf: all.map(() => 0.125) });
  });

  it("a linear trend of a non-linear series is the least-squares line over the last N years (reference: simple-statistics linearRegression)", () => {
    const values = [0.3, 0.9, 0.2, 1.7, 1.1, 2.6, 2.0, 3.3];
    const p: PathwayData = { startYear: 2000, agents: { "land-use": { erf: values } } };
    const out = extendPathway(p, { kind: "extend", toYear: 2012, method: "linear", fitYears: 4 });
    const fit = linearRegressionLine(linearRegression([2004, 2005, 2006, 2007].map((x, i) => [x, values[4 + i]!])));
    const tail = (out.agents["land-use"] as { erf: number[] }).erf.slice(8);
    expect(tail).toHaveLength(5);
    tail.forEach((v, k) => expect(v).toBeCloseTo(fit(2008 + k), 12));
    expect(linearTrendAhead(values, values.length, 0)).toBeCloseTo(
      linearRegressionLine(linearRegression(values.map((v, i) => [i, v])))(values.length - 1),
      12,
    );
  });

  it("refuses a target year not after the last, a fit window out of range, and a trend taking a concentration below zero", () => {
    const p: PathwayData = { startYear: 2000, agents: { ch4: { ppb: [40, 30, 20, 10] } } };
    expect(() => extendPathway(p, { kind: "extend", toYear: 2003, method: "hold" })).toThrow(
      /^toYear 2003 must come after the pathway's last year 2003$/,
    );
    expect(() => extendPathway(p, { kind: "extend", toYear: 2010, method: "linear", fitYears: 5 })).toThrow(
      /^fitYears 5 must lie from 2 to the pathway's 4 years$/,
    );
    expect(() => extendPathway(p, { kind: "extend", toYear: 2010, method: "linear", fitYears: 4 })).toThrow(
      /^method a linear trend takes the CH4 concentration below zero in 2005;/,
    );
    expect(() => extendPathway(p, { kind: "extend", toYear: 3000, method: "hold" })).toThrow(
      /^toYear 3000 would make the pathway 1001 years long; at most 1000 are accepted$/,
    );
  });
});
