import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { formatKelvin, formatMoney, formatProbability, moneyScale, modelSpecSchema, type PerilProfile, type Portfolio, type RunResult } from "@plumeline/contracts";
import { runEnsemble } from "@plumeline/engine";
import { beforeAll, describe, expect, it } from "vitest";
import type { WorkbookManifest } from "../exports/workbook-builder.js";
import { testModelVersionBody, testPathwayBody } from "../runs/runs.fixtures.js";
import { buildRunReport } from "./run-report.js";

/**
 * The PDF report read back with poppler's pdftotext (Debian poppler-utils), the way a reader's
 * copy-and-paste or a search would see it: the hashes and the horizon figures must be there as
 * text, exactly as the screen writes them, and the exploratory stamp on every page.
 */
const profiles: PerilProfile[] = [
  {
    id: "flood",
    name: "Heavy rainfall, Northmere Coast",
    peril: "flood-heavy-rainfall",
    region: "Northmere Coast",
    metric: "severity",
    baselineWarming: 1.1,
    scaling: { kind: "per-kelvin", rate: { type: "normal", mean: 0.07, sd: 0.015 } },
  },
];
const portfolio: Portfolio = {
  id: "pf",
  name: "Test baseline",
  rows: [
    { region: "Northmere Coast", peril: "flood-heavy-rainfall", currency: "EUR", aal: 18_400_000, loss100: 310_000_000, loss200: 455_000_000 },
    { region: "Ostrand", peril: "hail", currency: "EUR", aal: 3_900_000, loss100: 52_000_000, loss200: 66_000_000 },
  ],
};

let result: RunResult;
let manifest: WorkbookManifest;
let text: string;
let pages: string[];
let bytes: Buffer;
const dir = mkdtempSync(path.join(tmpdir(), "plumeline-report-"));

beforeAll(async () => {
  const high = testPathwayBody("Test high", 6);
  const low = testPathwayBody("Test low", 3);
  const spec = {
    seed: "report",
    members: 300,
    sampling: "latin-hypercube" as const,
    baseline: [1850, 1900] as [number, number],
    pathways: [high, low].map((p, i) => ({ id: `p${i + 1}`, name: p.name, startYear: p.startYear, agents: p.agents })),
    model: modelSpecSchema.parse(testModelVersionBody().model),
    perils: profiles,
    portfolio,
  };
  result = runEnsemble(spec);
  manifest = {
    runId: "9f1c2d3e-0000-4000-8000-000000000001",
    runName: "Board pack Q3",
    exploratory: true,
    createdBy: "Ana Analyst <analyst@harbourline.example>",
    createdAt: "2026-01-01T00:00:00.000Z",
    finishedAt: "2026-01-01T00:01:00.000Z",
    modelVersion: { id: "mv", name: "Wider aerosol", versionNumber: 2, status: "in-review", changeClass: "minor", decidedBy: null, decidedAt: null },
    pathways: [
      { id: "p1", name: "Test high", source: "hand-made test ramp", vintage: "test-1", startYear: 1850, endYear: 2100, checksum: "a".repeat(64) },
      {
        id: "p2",
        name: "Test low",
        // Long enough to wrap in its column: the row must grow to hold it, and every word must survive.
        source: "hand-made test ramp with a long description of where each agent's figures come from and how the years after 2020 were extended",
        vintage: "test-1",
        startYear: 1850,
        endYear: 2100,
        checksum: "b".repeat(64),
      },
    ],
    seed: "report",
    members: 300,
    sampling: "latin-hypercube",
    baseline: [1850, 1900],
    percentiles: [5, 17, 50, 83, 95],
    thresholds: [1.5, 2, 3],
    horizons: [2030, 2050, 2100],
    engineVersion: result.engineVersion,
    inputHash: result.inputHash,
    resultHash: result.resultHash,
    exportedBy: "Aki Actuary <actuary@harbourline.example>",
    exportedAt: "2026-01-02T09:30:00.000Z",
    statements: [{ kind: "reliance", text: "Relied on the pathway vintages as published.", by: "Aki Actuary", at: "2026-01-02T09:00:00.000Z" }],
  };
  bytes = await buildRunReport(manifest, result, spec);
  const file = path.join(dir, "report.pdf");
  writeFileSync(file, bytes);
  text = execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
  pages = text.split("\f").filter((p) => p.trim() !== "");
}, 60_000);

describe("run report PDF", () => {
  it("is a PDF whose text holds the hashes, the engine version and the seed", () => {
    expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(text).toContain(result.resultHash);
    expect(text).toContain(result.inputHash);
    expect(text).toMatch(new RegExp(`Engine version\\s+${result.engineVersion.replace(/\./g, "\\.")}`));
    expect(text).toMatch(/Seed\s+report/);
    expect(text).toContain("Relied on the pathway vintages as published.");
  });

  it("writes every horizon's percentiles and chances as the screen does", () => {
    for (const p of result.pathways) {
      const section = pages.filter((page) => page.includes(`Warming at the horizons — ${p.name}`)).join("\n");
      expect(section, p.name).not.toBe("");
      for (const h of p.horizons) {
        const cells = [h.year, ...["p5", "p17", "p50", "p83", "p95"].map((k) => formatKelvin(h.temperature[k])), ...["1.5", "2", "3"].map((t) => formatProbability(h.exceedance[t]))];
        const line = section.split("\n").find((l) => l.trim().startsWith(String(h.year)) && l.includes(formatKelvin(h.temperature.p50)));
        expect(line, `${p.name} ${h.year}`).toBeDefined();
        expect(line!.trim().split(/\s{2,}|\s(?=[<>\d])/).join(" ")).toContain(cells.slice(0, 6).join(" "));
      }
    }
  });

  it("stamps EXPLORATORY on every page and ends with the cautions and the manifest", () => {
    expect(pages.length).toBeGreaterThanOrEqual(5);
    for (const [i, page] of pages.entries()) {
      expect(page, `page ${i + 1}`).toContain("EXPLORATORY — not for filings");
      expect(page).toContain(`page ${i + 1} of ${pages.length}`);
    }
    expect(text).toContain("Scenarios are not forecasts");
    expect(text).toContain("a".repeat(64));
  });

  it("shows the portfolio totals in EUR m at three significant figures, with the note on diversification", () => {
    const total = result.perils!.pathways[0]!.totals![0]!;
    const scale = moneyScale([total.baseline.loss200]);
    expect(scale.suffix).toBe("m");
    const h = total.horizons[2]!;
    const totals = pages.filter((page) => page.includes("Portfolio totals — Test high")).join("\n");
    const row = totals.split("\n").find((l) => l.includes("2100") && l.includes("1-in-200 loss"));
    expect(row).toBeDefined();
    for (const k of ["p5", "p50", "p95"]) expect(row).toContain(formatMoney(h.loss200[k], scale));
    expect(row).toContain(formatMoney(total.baseline.loss200, scale));
    expect(text).toMatch(/no diversification credit/);
    expect(text).toContain("amounts in EUR m");
  });

  it("keeps charts vector (no raster image in the file) and rebuilds to the same bytes", async () => {
    expect(bytes.includes(Buffer.from("/Subtype /Image"))).toBe(false);
    const again = await buildRunReport(manifest, result, { perils: profiles });
    expect(again.equals(bytes)).toBe(true);
  });

  it("writes a long pathway source in full, wrapped within its row, and names bands by percentiles", () => {
    const words = pages[0]!.replace(/\s+/g, " ");
    expect(words).toContain("how the years after 2020 were extended");
    // The next row of the table (or the note under it) starts below the wrapped source, not on top of it.
    const lines = pages[0]!.split("\n");
    const sourceEnd = lines.findIndex((l) => l.includes("were extended"));
    const note = lines.findIndex((l) => l.includes("SHA-256"));
    expect(note).toBeGreaterThan(sourceEnd);
    // A raw ensemble's spread is not an assessed range, so no band is called "likely" (IPCC AR6 WG1 calibrated language, Mastrandrea et al. 2010).
    expect(text).not.toMatch(/likely/i);
    expect(text).toContain("17th–83rd");
  });
});
