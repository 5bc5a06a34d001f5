import { describe, expect, it } from "vitest";
import { formatIssues } from "./format-issues.js";
import { perilProfileSchema, perilProfilesSchema } from "./peril-profile.js";
import { CURRENCY_CODES, portfolioRowsSchema, portfolioSchema } from "./peril-portfolio.js";
import { runSpecSchema } from "./run-spec.js";
import { runResultSchema } from "./run-result.js";

/** Problems of a failed parse, one "path message" line each. */
function problems(schema: { safeParse(v: unknown): { success: boolean; error?: unknown } }, value: unknown): string[] {
  const out = schema.safeParse(value);
  expect(out.success).toBe(false);
  return formatIssues(out.error as Parameters<typeof formatIssues>[0]);
}

const flood = {
  id: "flood-north",
  name: "Heavy-rainfall flood, North Vale",
  peril: "flood-heavy-rainfall",
  region: "North Vale",
  metric: "severity",
  baselineWarming: 1.1,
  scaling: { kind: "per-kelvin", rate: { type: "fixed", value: 0.07 } },
};

const row = { region: "North Vale", peril: "flood-heavy-rainfall", currency: "EUR", aal: 12, loss100: 300, loss200: 420 };

describe("peril profile schema", () => {
  it("accepts a per-kelvin profile and a table profile", () => {
    expect(perilProfileSchema.parse(flood).scaling.kind).toBe("per-kelvin");
    const heat = {
      ...flood,
      id: "heat",
      peril: "heat",
      metric: "frequency",
      baselineWarming: 0,
      scaling: { kind: "table", points: [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 2.8 }], beyondTable: "hold" },
    };
    expect(perilProfileSchema.parse(heat).scaling.kind).toBe("table");
  });

  it("rejects baseline warming outside 0–3 K, naming the field", () => {
    expect(problems(perilProfileSchema, { ...flood, baselineWarming: 3.2 })[0]).toMatch(/^baselineWarming must lie between 0 and 3 K/);
    expect(problems(perilProfileSchema, { ...flood, baselineWarming: -0.1 })[0]).toMatch(/^baselineWarming /);
  });

  it("rejects rates that can reach -100 % per K, naming the distribution field", () => {
    const fixed = { ...flood, scaling: { kind: "per-kelvin", rate: { type: "fixed", value: -1 } } };
    expect(problems(perilProfileSchema, fixed)).toEqual([
      "scaling.rate.value must be > -1 (a rate of -100 % per K or less leaves no hazard)",
    ]);
    const uniform = { ...flood, scaling: { kind: "per-kelvin", rate: { type: "uniform", min: -1.5, max: 0.1 } } };
    expect(problems(perilProfileSchema, uniform)[0]).toMatch(/^scaling\.rate\.min must be > -1/);
    // mean - 6 sd = 0.07 - 1.8 < -1: a normal this wide reaches -100 % with non-negligible chance.
    const wide = { ...flood, scaling: { kind: "per-kelvin", rate: { type: "normal", mean: 0.07, sd: 0.3 } } };
    expect(problems(perilProfileSchema, wide)[0]).toMatch(/^scaling\.rate\.sd lets the rate reach -100 %/);
    // A usual uncertain rate passes: 7 ± 2 %/K.
    const usual = { ...flood, scaling: { kind: "per-kelvin", rate: { type: "normal", mean: 0.07, sd: 0.02 } } };
    expect(perilProfileSchema.safeParse(usual).success).toBe(true);
  });

  it("rejects a table whose warming does not strictly increase, or with non-positive multipliers", () => {
    const table = (points: unknown) => ({ ...flood, scaling: { kind: "table", points, beyondTable: "hold" } });
    const flat = problems(perilProfileSchema, table([{ warming: 1, multiplier: 1 }, { warming: 1, multiplier: 2 }]));
    expect(flat[0]).toMatch(/^scaling\.points\[1\]\.warming must be greater than points\[0\]\.warming \(1\)/);
    const down = problems(perilProfileSchema, table([{ warming: 2, multiplier: 1 }, { warming: 1.5, multiplier: 2 }]));
    expect(down[0]).toMatch(/^scaling\.points\[1\]\.warming /);
    const zero = problems(perilProfileSchema, table([{ warming: 0, multiplier: 0 }, { warming: 1, multiplier: 2 }]));
    expect(zero).toEqual(["scaling.points[0].multiplier must be > 0"]);
    expect(problems(perilProfileSchema, table([{ warming: 0, multiplier: 1 }]))).toEqual(["scaling.points must hold at least two points"]);
  });

  it("rejects duplicate profile ids", () => {
    expect(problems(perilProfilesSchema, [flood, flood])).toEqual(['[1].id "flood-north" is used twice (also perils[0])']);
  });
});

describe("portfolio schema", () => {
  it("accepts a valid portfolio", () => {
    expect(portfolioSchema.parse({ id: "pf", name: "Demo", rows: [row] }).rows).toHaveLength(1);
  });

  it("knows real ISO 4217 codes and rejects unknown ones, naming row and field", () => {
    // ISO 4217 list from the currency-codes package: EUR, USD, JPY, CHF exist; "EUX" does not.
    for (const c of ["EUR", "USD", "JPY", "CHF"]) expect(CURRENCY_CODES).toContain(c);
    expect(problems(portfolioRowsSchema, [row, { ...row, region: "South Fen", currency: "EUX" }])).toEqual([
      "[1].currency must be an ISO 4217 currency code in capitals, such as EUR",
    ]);
  });

  it("rejects negative losses and a 1-in-200 loss below the 1-in-100 loss", () => {
    expect(problems(portfolioRowsSchema, [{ ...row, aal: -1 }])).toEqual(["[0].aal must not be negative"]);
    expect(problems(portfolioRowsSchema, [{ ...row, loss100: 500, loss200: 400 }])).toEqual([
      "[0].loss200 must be at least loss100 (500): a 1-in-200 loss cannot be below the 1-in-100 loss",
    ]);
  });

  it("rejects duplicate (region, peril) rows, naming both rows", () => {
    const rows = [row, { ...row, peril: "wind" }, { ...row, aal: 5 }];
    expect(problems(portfolioRowsSchema, rows)).toEqual([
      '[2].region repeats region "North Vale" with peril "flood-heavy-rainfall", already given in rows[0]',
    ]);
  });

  it("names the row inside a run spec's portfolio", () => {
    const issues = problems(portfolioSchema, { id: "pf", name: "Demo", rows: [row, { ...row, peril: "wind", loss100: -3 }] });
    expect(issues).toEqual(["rows[1].loss100 must not be negative"]);
  });
});

describe("run spec and result carry perils additively", () => {
  const climate = Object.fromEntries(
    ["ecs", "f2x", "upperHeatCapacity", "deepHeatCapacity", "heatExchange", "deepEfficacy"].map((k) => [k, { type: "fixed", value: 1 }]),
  );
  const base = {
    seed: "s",
    members: 10,
    sampling: "monte-carlo",
    pathways: [{ id: "p", name: "P", startYear: 1850, agents: { co2: { erf: Array(251).fill(0) } } }],
    model: { climate },
  };

  it("accepts a spec without perils (unchanged) and one with perils and a portfolio", () => {
    expect(runSpecSchema.parse(base).perils).toBeUndefined();
    const withPerils = runSpecSchema.parse({ ...base, perils: [flood], portfolio: { id: "pf", name: "Demo", rows: [row] } });
    expect(withPerils.perils?.[0]?.id).toBe("flood-north");
  });

  it("requires the 1850–1900 baseline when perils are given, and perils when a portfolio is given", () => {
    expect(problems(runSpecSchema, { ...base, baseline: [1951, 1980], perils: [flood] })).toContain(
      "baseline must be [1850, 1900] when perils are given (peril warming levels are measured against 1850–1900)",
    );
    expect(problems(runSpecSchema, { ...base, portfolio: { id: "pf", name: "Demo", rows: [row] } })).toContain(
      "portfolio needs at least one peril profile in perils to be projected",
    );
  });

  it("names the profile field inside a run spec", () => {
    expect(problems(runSpecSchema, { ...base, perils: [{ ...flood, baselineWarming: 4 }] })[0]).toMatch(/^perils\[0\]\.baselineWarming /);
  });

  it("result schema accepts a perils block and results without one", () => {
    const result = {
      engineVersion: "x",
      inputHash: "h",
      resultHash: "h",
      members: 1,
      effectiveMembers: 1,
      implied: { ecs: { p50: 3 }, tcr: { p50: 1.8 } },
      pathways: [],
    };
    expect(runResultSchema.safeParse(result).success).toBe(true);
    const summary = { p5: 1, p50: 1.1, p95: 1.2, mean: 1.1 };
    const perils = {
      portfolioId: "pf",
      unmatchedRows: [],
      pathways: [
        {
          pathwayId: "p",
          profiles: [
            {
              profileId: "flood-north",
              name: "n",
              peril: "flood-heavy-rainfall",
              region: "North Vale",
              metric: "frequency",
              baselineWarming: 1.1,
              horizons: [
                {
                  year: 2050,
                  multiplier: summary,
                  returnPeriods: { "100": summary, "200": summary },
                  losses: [{ region: "North Vale", peril: "flood-heavy-rainfall", currency: "EUR", aal: summary, loss100: summary, loss200: summary }],
                },
              ],
            },
          ],
        },
      ],
    };
    expect(runResultSchema.safeParse({ ...result, perils }).success).toBe(true);
  });
});

describe("table profiles by return period", () => {
  const points = [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 2.8 }];
  const heat = (scaling: unknown) => ({ ...flood, id: "heat", peril: "heat", metric: "frequency", baselineWarming: 0, scaling });

  it("reads a table saved without a return period as one 10-year table (stated default), holding beyond it", () => {
    const parsed = perilProfileSchema.parse(heat({ kind: "table", points, beyondTable: "hold" }));
    expect(parsed.scaling).toEqual({ kind: "table", tables: [{ returnPeriod: 10, points }], beyondTable: "hold", beyondReturnPeriods: "hold" });
  });

  it("accepts several tables with increasing return periods and refuses disorder, naming the field", () => {
    const fifty = [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 4.8 }];
    const ok = heat({ kind: "table", tables: [{ returnPeriod: 10, points }, { returnPeriod: 50, points: fifty }], beyondTable: "hold", beyondReturnPeriods: "extrapolate" });
    expect(perilProfileSchema.parse(ok).scaling).toMatchObject({ tables: [{ returnPeriod: 10 }, { returnPeriod: 50 }], beyondReturnPeriods: "extrapolate" });
    const disorder = heat({ kind: "table", tables: [{ returnPeriod: 50, points }, { returnPeriod: 10, points: fifty }], beyondTable: "hold" });
    expect(problems(perilProfileSchema, disorder)).toEqual([
      "scaling.tables[1].returnPeriod must be greater than tables[0].returnPeriod (50): return periods must strictly increase",
    ]);
    expect(problems(perilProfileSchema, heat({ kind: "table", tables: [{ returnPeriod: 0.5, points }], beyondTable: "hold" }))[0]).toMatch(
      /^scaling\.tables\[0\]\.returnPeriod must lie between 1 and 10000 years/,
    );
    expect(problems(perilProfileSchema, heat({ kind: "table", tables: [{ returnPeriod: 10, points }], points, beyondTable: "hold" }))[0]).toMatch(/^scaling\.points must not be given with tables/);
    expect(problems(perilProfileSchema, heat({ kind: "table", beyondTable: "hold" }))).toEqual(["scaling.tables must hold at least one table"]);
  });
});
