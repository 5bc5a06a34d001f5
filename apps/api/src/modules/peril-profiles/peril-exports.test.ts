import { modelSpecSchema, PERIL_RULES, PORTFOLIO_TOTAL_NOTES, RESULT_CAUTIONS, type PerilProfile, type Portfolio, type RunResult } from "@plumeline/contracts";
import { applyPerilLens, assemblePerilResult, runEnsemble } from "@plumeline/engine";
import ExcelJS from "exceljs";
import { parse } from "csv-parse/sync";
import { beforeAll, describe, expect, it } from "vitest";
import { tableToCsv } from "../exports/csv-writer.js";
import { resultTable } from "../exports/result-tables.js";
import { buildRunWorkbook, type WorkbookManifest } from "../exports/workbook-builder.js";
import { testModelVersionBody, testPathwayBody } from "../runs/runs.fixtures.js";
import { PERIL_TABLE_SHEETS, perilTable } from "./peril-result-tables.js";
import { perilWarnings } from "./peril-warnings.js";
import { portfolioTotalsTable } from "./portfolio-totals-table.js";

/**
 * The peril tables and workbook sheets against the result JSON they come from. The result is
 * the engine's own (runEnsemble on a small test spec) with a perils block made by the engine's
 * applyPerilLens on stated member warmings, so every number is real engine output.
 */
const profiles: PerilProfile[] = [
  {
    id: "flood",
    name: "Flood, North",
    peril: "flood-heavy-rainfall",
    region: "North",
    metric: "severity",
    baselineWarming: 1.1,
    scaling: { kind: "per-kelvin", rate: { type: "range", p50: 0.07, low: 0.05, high: 0.09, coverage: 90, shape: "split-normal" } },
  },
  {
    id: "heat",
    name: "Heat, North",
    peril: "heat",
    region: "North",
    metric: "frequency",
    baselineWarming: 1,
    scaling: {
      kind: "table",
      tables: [{ returnPeriod: 10, points: [{ warming: 1, multiplier: 2.8 }, { warming: 2, multiplier: 5.6 }, { warming: 4, multiplier: 9.4 }] }],
      beyondTable: "hold",
      beyondReturnPeriods: "hold",
    },
  },
];
const portfolio: Portfolio = {
  id: "pf",
  name: "Test baseline",
  rows: [
    { region: "North", peril: "flood-heavy-rainfall", currency: "EUR", aal: 1000, loss100: 20000, loss200: 26000 },
    { region: "North", peril: "heat", currency: "EUR", aal: 300, loss100: 5000, loss200: 6000 },
    { region: "South", peril: "hail", currency: "EUR", aal: 50, loss100: 900, loss200: 1000 },
  ],
};

let result: RunResult;
/** The member warmings the lens was given, per horizon. */
let stated: number[][];
const manifest = (r: RunResult): WorkbookManifest => ({
  runId: "run-1",
  runName: "Peril export test",
  exploratory: true,
  createdBy: "tester",
  createdAt: "2026-01-01T00:00:00.000Z",
  finishedAt: "2026-01-01T00:01:00.000Z",
  modelVersion: { id: "mv", name: "Test", versionNumber: 1, status: "draft", changeClass: null, decidedBy: null, decidedAt: null },
  pathways: [],
  seed: "s",
  members: r.members,
  sampling: "monte-carlo",
  baseline: [1850, 1900],
  percentiles: [5, 17, 50, 83, 95],
  thresholds: [1.5, 2, 3],
  horizons: [2030, 2050, 2100],
  engineVersion: r.engineVersion,
  inputHash: r.inputHash,
  resultHash: r.resultHash,
  exportedBy: "tester",
  exportedAt: "2026-01-02T00:00:00.000Z",
  statements: [],
});

beforeAll(() => {
  const pathway = testPathwayBody();
  const spec = {
    seed: "peril-export",
    members: 40,
    sampling: "monte-carlo" as const,
    pathways: [{ id: "p1", name: pathway.name, startYear: pathway.startYear, agents: pathway.agents }],
    model: testModelVersionBody().model,
  };
  const base = runEnsemble(spec);
  const members = 40;
  const horizons = [2030, 2050, 2100];
  // Stated member warmings (K above 1850–1900): a spread of 0.8 K around 1.4 / 1.9 / 2.9 K.
  const warmingAtHorizons = [1.4, 1.9, 2.9].map((centre) => Float64Array.from({ length: members }, (_, i) => centre - 0.4 + (0.8 * i) / (members - 1)));
  stated = warmingAtHorizons.map((w) => Array.from(w));
  const lens = applyPerilLens({
    pathwayId: "p1",
    seed: "peril-export",
    sampling: "monte-carlo",
    profiles,
    portfolio,
    horizons,
    warmingAtHorizons,
    weights: null,
    percentiles: [5, 17, 50, 83, 95],
  });
  result = { ...base, perils: assemblePerilResult(profiles, portfolio, [lens]) };
});

describe("peril result tables", () => {
  it("multipliers: one row per profile and horizon, each cell the JSON's value", () => {
    const table = perilTable(result, "peril-multipliers");
    expect(table.columns.slice(9, 16)).toEqual([
      "multiplier_return_period_years",
      "multiplier_p5",
      "multiplier_p17",
      "multiplier_p50",
      "multiplier_p83",
      "multiplier_p95",
      "multiplier_mean",
    ]);
    expect(table.columns.slice(-5)).toEqual(["table_return_periods_years", "read_outside_tables", "share_below_table", "share_above_table", "beyond_table_warning"]);
    expect(table.rows).toHaveLength(2 * 3);
    const flood2050 = table.rows.find((r) => r[2] === "flood" && r[8] === 2050)!;
    const json = result.perils!.pathways[0]!.profiles[0]!.horizons[1]!;
    expect(flood2050.slice(10, 16)).toEqual([json.multiplier.p5, json.multiplier.p17, json.multiplier.p50, json.multiplier.p83, json.multiplier.p95, json.multiplier.mean]);
    expect(flood2050.slice(16, 22)).toEqual(Object.values(json.tailMultipliers!["100"]));
    // Per-kelvin: no table, so no return periods, shares or warning.
    expect(flood2050.slice(-5)).toEqual([null, null, null, null, null]);
  });

  it("multipliers: a table profile states its return periods and the share of members beyond its warming range", () => {
    const table = perilTable(result, "peril-multipliers");
    // The heat table covers 1–4 K. Count the stated member warmings outside it, horizon by horizon.
    stated.forEach((warming, h) => {
      const below = warming.filter((w) => w < 1).length / warming.length;
      const above = warming.filter((w) => w > 4).length / warming.length;
      const row = table.rows.find((r) => r[2] === "heat" && r[8] === [2030, 2050, 2100][h])!;
      expect(row.slice(-5)).toEqual(["10", "100 200", below, above, null]);
    });
  });

  it("multipliers: more than 5 % of members past the table's end is a warning in the row", () => {
    const heat = result.perils!.pathways[0]!.profiles[1]!;
    // Move the 2100 horizon's table end below the members: a 2.5 K end leaves the members above 2.5 K (of 2.5–3.3 K) beyond it.
    const shifted = structuredClone(result);
    const profile = shifted.perils!.pathways[0]!.profiles[1]!;
    profile.table = { ...heat.table!, warmingRange: [1, 2.5] };
    profile.horizons[2]!.beyondTable = { below: 0, above: 0.95 };
    const row = perilTable(shifted, "peril-multipliers").rows.find((r) => r[2] === "heat" && r[8] === 2100)!;
    expect(row.at(-1)).toBe("95.0 % of members lie outside the table's 1–2.5 K: their multipliers are held at the end value");
    profile.horizons[2]!.beyondTable = { below: 0.02, above: 0.03 };
    expect(perilTable(shifted, "peril-multipliers").rows.find((r) => r[2] === "heat" && r[8] === 2100)!.at(-1)).toBeNull();
  });

  it("return periods: frequency profiles only, 100 and 200 rows; 1-in-100 becomes 100 / multiplier", () => {
    const table = perilTable(result, "peril-return-periods");
    expect(table.rows.every((r) => r[2] === "heat")).toBe(true);
    expect(table.rows).toHaveLength(3 * 2);
    const heat = result.perils!.pathways[0]!.profiles[1]!.horizons[2]!;
    const row = table.rows.find((r) => r[8] === 2100 && r[9] === 100)!;
    const json = heat.returnPeriods!["100"];
    expect(row.slice(10, 16)).toEqual([json.p5, json.p17, json.p50, json.p83, json.p95, json.mean]);
    // One 10-year table: the 1-in-100 figures are read beyond it.
    expect(row[16]).toBe("yes");
    // Return-period identity T' = T / m (return period = 1 / annual frequency): the 5th percentile of 100/m sits next to 100 / (95th percentile of m).
    // Not equal: R-7 interpolates between order statistics, and 100/m is convex, so the interpolated value is the larger.
    const identity = 100 / heat.multiplier.p95!;
    expect(row[10] as number).toBeGreaterThanOrEqual(identity - 1e-12);
    expect(((row[10] as number) - identity) / identity).toBeLessThan(1e-3);
  });

  it("losses: one row per matched portfolio row and measure; the unmatched hail row is not projected", () => {
    const table = perilTable(result, "peril-losses");
    expect(table.rows).toHaveLength(2 * 3 * 3);
    expect(table.rows.some((r) => r[4] === "hail")).toBe(false);
    expect(result.perils!.unmatchedRows).toEqual([{ region: "South", peril: "hail" }]);
    // Severity: AAL scales by the multiplier, member by member (severity scaling of the peril lens, packages/engine/src/peril); the median of m·AAL is AAL × median m.
    const flood = result.perils!.pathways[0]!.profiles[0]!.horizons[0]!;
    const aal = table.rows.find((r) => r[2] === "flood" && r[8] === 2030 && r[10] === "aal")!;
    expect(aal[13]).toBeCloseTo(1000 * flood.multiplier.p50!, 6);
  });

  it("CSV export of a peril table reads back to the same numbers", () => {
    const table = resultTable(result, "peril-multipliers");
    const back = parse<Record<string, string>>(tableToCsv(table), { columns: true });
    expect(back).toHaveLength(table.rows.length);
    expect(Number(back[0]!.multiplier_p95)).toBe(table.rows[0]![14]);
  });

  it("a result without a perils block gives headers only", () => {
    const { perils: _p, ...plain } = result;
    for (const t of ["peril-multipliers", "peril-return-periods", "peril-losses"] as const) expect(perilTable(plain as RunResult, t).rows).toEqual([]);
  });
});

describe("portfolio totals table", () => {
  it("one row per pathway, horizon, metric and currency; percentiles as in the JSON; change = percentile − today's total", () => {
    const table = portfolioTotalsTable(result);
    expect(table.columns).toEqual([
      "pathway_id", "pathway_name", "horizon", "metric", "currency", "rows", "projected_rows", "baseline",
      "p5", "p17", "p50", "p83", "p95", "mean", "change_p5", "change_p17", "change_p50", "change_p83", "change_p95",
    ]);
    expect(table.rows).toHaveLength(3 * 3);
    const total = result.perils!.pathways[0]!.totals![0]!;
    // Today's total is the plain sum of the three rows, hail included (no profile: unchanged).
    expect(total.baseline).toEqual({ aal: 1350, loss100: 25900, loss200: 33000 });
    expect([total.rows, total.projectedRows]).toEqual([3, 2]);
    const row = table.rows.find((r) => r[2] === 2100 && r[3] === "loss_1_in_200")!;
    const json = total.horizons[2]!.loss200;
    expect(row.slice(4, 14)).toEqual(["EUR", 3, 2, 33000, json.p5, json.p17, json.p50, json.p83, json.p95, json.mean]);
    expect(row[16]).toBeCloseTo(json.p50! - 33000, 9);
    // CSV keeps full precision: reading it back gives the same doubles.
    const back = parse<Record<string, string>>(tableToCsv(resultTable(result, "portfolio-totals")), { columns: true });
    expect(Number(back.find((r) => r.horizon === "2100" && r.metric === "loss_1_in_200")!.p50)).toBe(json.p50);
  });

  it("a result without totals gives the header alone", () => {
    const { perils: _p, ...plain } = result;
    expect(portfolioTotalsTable(plain as RunResult).rows).toEqual([]);
  });
});

describe("peril workbook sheets", () => {
  async function readBack(r: RunResult) {
    const bytes = await buildRunWorkbook(manifest(r), r, modelSpecSchema.parse(testModelVersionBody().model), { kind: "omitted", reason: "not part of this test" });
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(bytes as unknown as ArrayBuffer);
    return wb;
  }

  it("holds Peril multipliers, Return periods and Projected losses equal to the JSON, and the peril rules in Cautions", async () => {
    const wb = await readBack(result);
    for (const [table, sheetName] of PERIL_TABLE_SHEETS) {
      const sheet = wb.getWorksheet(sheetName)!;
      expect(sheet, sheetName).toBeDefined();
      const expected = perilTable(result, table);
      const header = (sheet.getRow(2).values as unknown[]).slice(1);
      expect(header).toEqual(expected.columns);
      expected.rows.forEach((row, i) => {
        const cells = (sheet.getRow(i + 3).values as unknown[]).slice(1);
        // An empty cell reads back as missing: compare it as null.
        expect(Array.from({ length: row.length }, (_, j) => cells[j] ?? null)).toEqual(row);
      });
      expect(sheet.rowCount).toBe(expected.rows.length + 2);
      expect(sheet.getCell("A1").text).toMatch(/^EXPLORATORY/);
    }
    const cautions = wb.getWorksheet("Cautions")!;
    const texts = (cautions.getColumn(1).values as unknown[]).filter((v): v is string => typeof v === "string");
    for (const c of [...RESULT_CAUTIONS, ...PERIL_RULES]) expect(texts).toContain(c);
    // The run's own warnings: the one 10-year heat table is read beyond itself for 1-in-100 and 1-in-200.
    expect(perilWarnings(result)).toEqual(["Heat, North: the tables are for 10-year events, so the 1-in-100 and 1-in-200 figures are read beyond them (the nearest table held)."]);
    for (const w of perilWarnings(result)) expect(texts).toContain(w);
  });

  it("has a Portfolio totals sheet in money format with the notes on what the totals are", async () => {
    const wb = await readBack(result);
    const sheet = wb.getWorksheet("Portfolio totals")!;
    expect((sheet.getRow(2).values as unknown[]).slice(1)).toEqual(portfolioTotalsTable(result).columns);
    expect(sheet.getRow(3).getCell("I").numFmt).toBe("#,##0");
    expect(sheet.getRow(3).getCell("C").numFmt).toBe("0");
    const texts = (sheet.getColumn(1).values as unknown[]).filter((v): v is string => typeof v === "string");
    for (const note of PORTFOLIO_TOTAL_NOTES) expect(texts).toContain(note);
  });

  it("leaves the peril sheets out when the run carried no profiles", async () => {
    const { perils: _p, ...plain } = result;
    const wb = await readBack(plain);
    expect(wb.getWorksheet("Peril multipliers")).toBeUndefined();
  });
});
