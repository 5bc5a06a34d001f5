import { describe, expect, it } from "vitest";
import { SpecError } from "../spec/spec-error.js";
import { validatePerilInputs } from "./validate-peril-inputs.js";
import type { PerilProfile, Portfolio, PortfolioRow } from "./types.js";

const flood: PerilProfile = {
  id: "flood",
  name: "Flood",
  peril: "flood-heavy-rainfall",
  region: "North Vale",
  metric: "severity",
  baselineWarming: 1.1,
  scaling: { kind: "per-kelvin", rate: { type: "normal", mean: 0.07, sd: 0.02 } },
};
const row: PortfolioRow = { region: "North Vale", peril: "flood-heavy-rainfall", currency: "EUR", aal: 12, loss100: 300, loss200: 420 };
const portfolio = (rows: PortfolioRow[]): Portfolio => ({ id: "pf", name: "Demo", rows });
const BASE: [number, number] = [1850, 1900];

function problem(run: () => void): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(SpecError);
    return (error as Error).message;
  }
  throw new Error("expected a SpecError");
}

describe("validatePerilInputs", () => {
  it("accepts valid profiles and a portfolio, and an absent peril part", () => {
    expect(() => validatePerilInputs([flood], portfolio([row]), BASE)).not.toThrow();
    expect(() => validatePerilInputs(undefined, undefined, [1951, 1980])).not.toThrow();
  });

  it("names the profile and field of a bad baseline warming, rate or table", () => {
    expect(problem(() => validatePerilInputs([{ ...flood, baselineWarming: 3.5 }], null, BASE))).toMatch(/^perils\[0\]\.baselineWarming must lie between 0 and 3 K/);
    const fixedRate: PerilProfile = { ...flood, id: "flood-2", scaling: { kind: "per-kelvin", rate: { type: "fixed", value: -1 } } };
    expect(problem(() => validatePerilInputs([flood, fixedRate], null, BASE))).toMatch(/^perils\[1\]\.scaling\.rate lets the rate reach -100 %/);
    const badSd: PerilProfile = { ...flood, scaling: { kind: "per-kelvin", rate: { type: "normal", mean: 0.07, sd: 0 } } };
    expect(problem(() => validatePerilInputs([badSd], null, BASE))).toMatch(/^perils\[0\]\.scaling\.rate\.sd must be > 0/);
    const flat: PerilProfile = { ...flood, scaling: { kind: "table", points: [{ warming: 1, multiplier: 1 }, { warming: 0.5, multiplier: 2 }], beyondTable: "hold" } };
    expect(problem(() => validatePerilInputs([flat], null, BASE))).toMatch(/^perils\[0\]\.scaling\.points\[1\]\.warming must be greater/);
    expect(problem(() => validatePerilInputs([flood, flood], null, BASE))).toBe('perils[1].id "flood" is used twice');
  });

  it("names the row and field of bad portfolio rows", () => {
    expect(problem(() => validatePerilInputs([flood], portfolio([row, { ...row, peril: "wind", aal: -5 }]), BASE))).toBe(
      "portfolio.rows[1].aal must not be negative",
    );
    expect(problem(() => validatePerilInputs([flood], portfolio([{ ...row, loss200: 200 }]), BASE))).toMatch(
      /^portfolio\.rows\[0\]\.loss200 must be at least loss100 \(300\)/,
    );
    expect(problem(() => validatePerilInputs([flood], portfolio([{ ...row, currency: "euro" }]), BASE))).toMatch(/^portfolio\.rows\[0\]\.currency /);
    expect(problem(() => validatePerilInputs([flood], portfolio([row, row]), BASE))).toMatch(
      /^portfolio\.rows\[1\]\.region repeats region "North Vale" with peril "flood-heavy-rainfall", already given in portfolio\.rows\[0\]/,
    );
  });

  it("needs the 1850–1900 baseline with perils, and perils with a portfolio", () => {
    expect(problem(() => validatePerilInputs([flood], null, [1951, 1980]))).toMatch(/^baseline must be \[1850, 1900\]/);
    expect(problem(() => validatePerilInputs([], portfolio([row]), BASE))).toMatch(/^portfolio needs at least one peril profile/);
  });
});
