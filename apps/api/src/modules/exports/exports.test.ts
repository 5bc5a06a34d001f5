import request from "supertest";
import ExcelJS from "exceljs";
import { parse } from "csv-parse/sync";
import type { RunResult } from "@plumeline/contracts";
import { RESULT_CAUTIONS, RESULT_TABLES } from "@plumeline/contracts";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createSqlJobQueue } from "../../queue/sql-job-queue.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { EngineThread } from "../../workers/engine-thread-client.js";
import { processNextRunJob } from "../../workers/process-run-job.js";
import { createModelVersion } from "../model-versions/model-versions.service.js";
import { createPathway } from "../pathways/pathways.service.js";
import { testModelVersionBody, testPathwayBody } from "../runs/runs.fixtures.js";
import { binaryBody } from "../../test-support/binary-body.js";
import SSF from "ssf";
import { buildRunWorkbook, type WorkbookManifest } from "./workbook-builder.js";
import { requestUserOf } from "../../test-support/request-user.js";
import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import JSZip from "jszip";
import { formatKelvin } from "@plumeline/contracts";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let admin: SignedInAgent;
let runId: string;
let result: RunResult;
/** The calibrated likelihood terms of IPCC AR6 WG1 (likely, very likely, unlikely, …). */
const CALIBRATED_TERM = /\b(?:un)?likely\b|\bvirtually certain\b/i;


beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary, admin] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary"), signIn(t.app, "admin")]);
  const user = await requestUserOf(t, "analyst");
  // A name a spreadsheet would run as a formula: it must come out as text.
  const pathway = await createPathway(t.ctx, user, testPathwayBody('=HYPERLINK("http://evil.example","x")'));
  const version = await createModelVersion(t.ctx, user, testModelVersionBody({ name: "@draft assumptions" }));
  const res = await analyst.post("/api/runs").send({ modelVersionId: version.id, pathwayIds: [pathway.id], members: 300, seed: "export", sampling: "monte-carlo" });
  runId = res.body.id;
  const thread = new EngineThread("export-test");
  try {
    expect(await processNextRunJob(t.ctx, createSqlJobQueue(t.ctx.models.Job), "export-test", thread)).toBe("succeeded");
  } finally {
    await thread.terminate();
  }
  result = (await analyst.get(`/api/runs/${runId}/result`)).body;
});
afterAll(async () => t.close());

describe("GET /api/runs/:id/workbook.xlsx", () => {
  let workbook: ExcelJS.Workbook;

  it("returns a workbook with the manifest first; its numbers equal the JSON result", async () => {
    const res = await actuary.get(`/api/runs/${runId}/workbook.xlsx`).buffer(true).parse(binaryBody);
    expect(res.status).toBe(200);
    expect(res.headers["content-disposition"]).toContain("EXPLORATORY");
    workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(res.body);
    expect(workbook.worksheets.map((w) => w.name)).toEqual([
      "Manifest", "Temperature", "Horizons", "Exceedance", "Crossing years", "Sensitivity", "Forcing", "Imbalance", "Members", "Inputs", "Cautions",
    ]);
    const temperature = workbook.getWorksheet("Temperature")!;
    const header = (temperature.getRow(2).values as unknown[]).slice(1);
    expect(header).toEqual(["pathway_id", "pathway_name", "year", "p5", "p17", "p50", "p83", "p95", "mean"]);
    const p = result.pathways[0]!;
    for (const year of [1850, 2030, 2100]) {
      const i = p.years.indexOf(year);
      const row = temperature.getRow(3 + i).values as unknown[];
      expect(row[3]).toBe(year);
      expect(row.slice(4)).toEqual(["p5", "p17", "p50", "p83", "p95", "mean"].map((k) => p.temperature[k]![i]));
    }
    const horizons = workbook.getWorksheet("Horizons")!;
    const h2100 = p.horizons.find((h) => h.year === 2100)!;
    const hRow = horizons.getRow(3 + p.horizons.indexOf(h2100)).values as unknown[];
    expect(hRow.slice(3, 9)).toEqual([2100, h2100.temperature.p5, h2100.temperature.p17, h2100.temperature.p50, h2100.temperature.p83, h2100.temperature.p95]);
  });

  it("formats every numeric cell (years as 0, chances as %, kelvin as 0.00), freezes the header rows, sizes the columns", () => {
    let numeric = 0;
    // The Members sheet keeps the General format on purpose: every digit a validator recomputes from.
    for (const sheet of workbook.worksheets.filter((w) => w.name !== "Members")) {
      sheet.eachRow((row, rowNumber) =>
        row.eachCell((cell) => {
          if (typeof cell.value !== "number") return;
          numeric++;
          expect(cell.numFmt, `${sheet.name}!${cell.address} (row ${rowNumber})`).toMatch(/^(0|0\.0+|0\.0#|#,##0(\.0+)?|0\.0%|"< 0\.1%"|"> 99\.9%")$/);
        }),
      );
    }
    expect(numeric).toBeGreaterThan(1000);
    const horizons = workbook.getWorksheet("Horizons")!;
    const columns = (horizons.getRow(2).values as string[]).slice(1);
    const cell = (name: string) => horizons.getRow(3).getCell(columns.indexOf(name) + 1);
    expect(cell("year").numFmt).toBe("0");
    expect(cell("temperature_p50_K").numFmt).toBe("0.00");
    expect(cell("p_exceed_2K").numFmt).toBe("0.0%");
    expect(cell("forcing_p50_Wm2").numFmt).toBe("0.00");
    expect(workbook.getWorksheet("Crossing years")!.getRow(3).getCell(4).numFmt).toBe("0");
    for (const name of ["Temperature", "Horizons", "Exceedance", "Crossing years", "Sensitivity", "Forcing", "Imbalance"]) {
      const sheet = workbook.getWorksheet(name)!;
      expect(sheet.views[0], name).toMatchObject({ state: "frozen", ySplit: 2 });
      sheet.columns.forEach((c) => expect(c.width, `${name} column ${c.number}`).toBeGreaterThanOrEqual(10));
    }
  });

  it("states EXPLORATORY in bold on the manifest with the hashes, checksums and cautions", () => {
    const manifest = workbook.getWorksheet("Manifest")!;
    const status = manifest.getRow(1).getCell(2);
    expect(status.text).toMatch(/^EXPLORATORY/);
    expect(status.font?.bold).toBe(true);
    const values = manifest.getSheetValues().flat().map(String);
    expect(values).toContain(result.resultHash);
    expect(values).toContain(result.inputHash);
    expect(values).toContain(result.engineVersion);
    expect(values.some((v) => /^[0-9a-f]{64}$/.test(v))).toBe(true); // pathway checksum
    const cautions = workbook.getWorksheet("Cautions")!.getSheetValues().flat().map(String);
    for (const c of RESULT_CAUTIONS) expect(cautions).toContain(c);
  });

  it("writes its times in UTC and says so on the manifest", async () => {
    const manifest = workbook.getWorksheet("Manifest")!;
    const valueOf = (label: string) => (manifest.getSheetValues().find((row) => Array.isArray(row) && row[1] === label) as unknown[] | undefined)?.[2];
    expect(valueOf("Times")).toBe("All times in this workbook are UTC.");
    // The run's own ISO 8601 time (a trailing Z is UTC) read as date, space, time to the second, "UTC".
    const created = (await analyst.get(`/api/runs/${runId}`)).body.createdAt as string;
    expect(created).toMatch(/Z$/);
    expect(valueOf("Run created at")).toBe(`${created.slice(0, 10)} ${created.slice(11, 19)} UTC`);
    for (const label of ["Run finished at", "Exported at"]) expect(valueOf(label), label).toMatch(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2} UTC$/);
  });

  it("labels bands by their percentiles: no calibrated likelihood word on any sheet", () => {
    // IPCC AR6 WG1 reserves "likely", "very likely", … (calibrated uncertainty language, after
    // Mastrandrea et al. 2010) for its authors' assessed ranges; an ensemble's 17th–83rd or
    // 5th–95th percentile band is not one, so the workbook never calls it that.
    for (const sheet of workbook.worksheets) {
      const text = sheet.getSheetValues().flat().map(String).join("\n");
      expect(text, sheet.name).not.toMatch(CALIBRATED_TERM);
    }
    const header = (workbook.getWorksheet("Horizons")!.getRow(2).values as unknown[]).slice(1);
    expect(header).toContain("temperature_p17_K");
    // A range input is named for its fit: a split (two-piece) law whose density jumps at the median.
    const inputs = workbook.getWorksheet("Inputs")!.getSheetValues().flat().map(String);
    expect(inputs).toContain("median 3, 5th–95th percentiles 2 to 5, split (two-piece) lognormal");
    expect(header).toContain("temperature_p95_K");
  });

  it("neutralises text that a spreadsheet would run as a formula", () => {
    // OWASP CSV-injection guidance: prefix = + - @ with an apostrophe so the cell stays text.
    const temperature = workbook.getWorksheet("Temperature")!;
    expect(temperature.getRow(3).getCell(2).value).toBe(`'=HYPERLINK("http://evil.example","x")`);
    const manifestText = workbook.getWorksheet("Manifest")!.getSheetValues().flat().map(String);
    expect(manifestText.some((v) => v.startsWith("'@draft assumptions"))).toBe(true);
    expect(manifestText.some((v) => v.startsWith("=") || v.startsWith("@"))).toBe(false);
  });

  it("records the export (exports table + audit) and lists it", async () => {
    const list = await actuary.get("/api/exports?mine=true");
    expect(list.status).toBe(200);
    expect(list.body.items[0]).toMatchObject({ runId, format: "xlsx", table: "workbook", exploratory: true, resultHash: result.resultHash });
    expect(list.body.items[0].checksum).toMatch(/^[0-9a-f]{64}$/);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "export.created", entityId: runId } })).toBe(1);
  });

  it("answers 401, 403 (admin lacks exports:create), 404 and 409", async () => {
    expect((await request(t.app).get(`/api/runs/${runId}/workbook.xlsx`)).status).toBe(401);
    const denied = await admin.get(`/api/runs/${runId}/workbook.xlsx`);
    expect(denied.status).toBe(403);
    expect(denied.body.error.message).toContain("exports:create");
    expect((await actuary.get("/api/runs/missing/workbook.xlsx")).status).toBe(404);
    expect((await request(t.app).get("/api/exports")).status).toBe(401);
    expect((await actuary.get("/api/exports?mine=maybe")).status).toBe(400);
  });
});

describe("GET /api/runs/:id/tables/:table.csv", () => {
  it("writes each table as CSV whose numbers read back equal the JSON", async () => {
    const res = await actuary.get(`/api/runs/${runId}/tables/exceedance.csv`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toContain("text/csv");
    const rows = parse<Record<string, string>>(res.text, { columns: true });
    const p = result.pathways[0]!;
    const i = p.years.indexOf(2100);
    expect(Number(rows[i]!.year)).toBe(2100);
    expect(Number(rows[i]!.p_exceed_2K)).toBe(p.exceedance["2"]![i]);
    expect(rows[0]!.pathway_name).toBe(`'=HYPERLINK("http://evil.example","x")`);
    for (const table of ["temperature", "forcing", "imbalance", "horizons", "crossing", "sensitivity"])
      expect((await actuary.get(`/api/runs/${runId}/tables/${table}.csv`)).status).toBe(200);
    expect((await t.ctx.models.ExportRecord.count({ where: { runId, format: "csv" } }))).toBe(7);
  });

  it("writes the sensitivity budget with each input's variance share beside its rank correlation", async () => {
    const rows = parse<Record<string, string>>((await actuary.get(`/api/runs/${runId}/tables/sensitivity.csv`)).text, { columns: true });
    const entries = result.pathways[0]!.sensitivity;
    expect(entries.length).toBeGreaterThan(0);
    expect(rows).toHaveLength(entries.length);
    entries.forEach((e, k) => {
      expect(rows[k]).toMatchObject({ horizon: String(e.horizon), input: e.input });
      expect(Number(rows[k]!.variance_share)).toBe(e.varianceShare);
      expect(Number(rows[k]!.rank_correlation)).toBe(e.index);
    });
  });

  it("names bands by their percentiles in every table: no calibrated likelihood word", async () => {
    for (const table of RESULT_TABLES) {
      const res = await actuary.get(`/api/runs/${runId}/tables/${table}.csv`);
      expect(res.status).toBe(200);
      expect(res.text, table).not.toMatch(CALIBRATED_TERM);
    }
  });

  it("answers 400 for an unknown table, 401 and 404", async () => {
    const bad = await actuary.get(`/api/runs/${runId}/tables/losses.csv`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe("table");
    expect((await request(t.app).get(`/api/runs/${runId}/tables/temperature.csv`)).status).toBe(401);
    expect((await actuary.get("/api/runs/missing/tables/temperature.csv")).status).toBe(404);
  });
});

describe("GET /api/runs/:id/report.pdf", () => {
  it("returns the run report; pdftotext finds the result hash and the horizon medians as the screen writes them", async () => {
    const res = await actuary.get(`/api/runs/${runId}/report.pdf`).buffer(true).parse(binaryBody);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    expect(res.headers["content-disposition"]).toMatch(new RegExp(`engine-${result.engineVersion.replace(/\./g, "\\.")}-result-${result.resultHash.slice(0, 12)}-EXPLORATORY-report\\.pdf`));
    const file = path.join(mkdtempSync(path.join(tmpdir(), "plumeline-report-api-")), "report.pdf");
    writeFileSync(file, res.body as Buffer);
    const text = execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
    expect(text).toContain(result.resultHash);
    for (const h of result.pathways[0]!.horizons) expect(text).toMatch(new RegExp(`${h.year}\\s+${formatKelvin(h.temperature.p5)}\\s+${formatKelvin(h.temperature.p17)}\\s+${formatKelvin(h.temperature.p50)}`));
    expect(text).toContain("EXPLORATORY");
    expect((await admin.get(`/api/runs/${runId}/report.pdf`)).status).toBe(403);
    expect((await request(t.app).get(`/api/runs/${runId}/report.pdf`)).status).toBe(401);
    expect((await actuary.get("/api/runs/missing/report.pdf")).status).toBe(404);
  });
});

describe("GET /api/runs/:id/tables.zip", () => {
  it("holds every table as plain CSV named by run, engine version and result hash, with manifest.json beside them", async () => {
    const res = await actuary.get(`/api/runs/${runId}/tables.zip`).buffer(true).parse(binaryBody);
    expect(res.status).toBe(200);
    const zip = await JSZip.loadAsync(res.body as Buffer);
    const names = Object.keys(zip.files);
    const stem = `-engine-${result.engineVersion}-result-${result.resultHash.slice(0, 12)}-EXPLORATORY-`;
    expect(names.filter((n) => n.endsWith(".csv")).every((n) => n.includes(stem))).toBe(true);
    expect(names.filter((n) => n.endsWith(".csv"))).toHaveLength(7);
    const manifest = JSON.parse(await zip.file("manifest.json")!.async("string"));
    expect(manifest).toMatchObject({ runId, resultHash: result.resultHash, engineVersion: result.engineVersion, exploratory: true });
    const horizons = manifest.tables.find((x: { table: string }) => x.table === "horizons");
    const csv = await zip.file(horizons.file)!.async("nodebuffer");
    expect(createHash("sha256").update(csv).digest("hex")).toBe(horizons.sha256);
    expect(csv.toString("utf8").split("\r\n")[0]).toMatch(/^pathway_id,pathway_name,year,temperature_p5_K/);
  });
});

describe("GET /api/exports/:exportId/file", () => {
  it("downloads any past export again, rebuilt and checked against its recorded checksum", async () => {
    const list = (await actuary.get(`/api/exports?runId=${runId}&mine=true`)).body.items as Array<{ id: string; format: string; checksum: string; fileName: string }>;
    for (const format of ["csv", "xlsx", "pdf", "zip"]) {
      const record = list.find((r) => r.format === format)!;
      expect(record, format).toBeDefined();
      const again = await actuary.get(`/api/exports/${record.id}/file`).buffer(true).parse(binaryBody);
      expect(again.status, format).toBe(200);
      expect(createHash("sha256").update(again.body as Buffer).digest("hex")).toBe(record.checksum);
      expect(again.headers["content-disposition"]).toContain(record.fileName);
    }
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "export.downloaded-again", entityId: runId } })).toBe(4);
  });

  it("refuses with 409 when the rebuilt file differs from the record, and answers 401, 403, 404", async () => {
    const record = (await t.ctx.models.ExportRecord.findOne({ where: { runId, format: "xlsx" } }))!;
    await t.ctx.models.ExportRecord.update({ checksum: "0".repeat(64) }, { where: { id: record.id } });
    const res = await actuary.get(`/api/exports/${record.id}/file`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("export_checksum_mismatch");
    expect(res.body.error.message).toContain("not handed out");
    expect((await request(t.app).get(`/api/exports/${record.id}/file`)).status).toBe(401);
    expect((await admin.get(`/api/exports/${record.id}/file`)).status).toBe(403);
    expect((await actuary.get("/api/exports/missing/file")).status).toBe(404);
  });
});

describe("probabilities on the workbook", () => {
  it("show as percentages that never round a possibility away, never in scientific notation; the cell keeps the value", async () => {
    // A weighted ensemble can give a chance such as 5e-109. SheetJS SSF (an independent
    // implementation of the ECMA-376 number formats) renders each cell as a spreadsheet would.
    const tweaked = structuredClone(result);
    const p = tweaked.pathways[0]!;
    const i = p.years.indexOf(2100);
    const shown: Array<[number, string]> = [
      [5e-109, "< 0.1%"],
      [0.0004, "< 0.1%"],
      [0.0005, "0.1%"],
      [0.123456, "12.3%"],
      [0.9996, "> 99.9%"],
      [0, "0.0%"],
      [1, "100.0%"],
    ];
    shown.forEach(([v], k) => (p.exceedance["2"]![i - k] = v));
    const run = (await t.ctx.models.Run.findByPk(runId))!;
    const manifest = {
      runId, runName: run.name, exploratory: true, createdBy: "a", createdAt: run.createdAt.toISOString(), finishedAt: null,
      modelVersion: { id: run.modelVersionId, name: "v", versionNumber: 1, status: "draft", changeClass: null, decidedBy: null, decidedAt: null },
      pathways: [], seed: run.seed, members: run.members, sampling: run.sampling, baseline: run.spec.baseline, percentiles: run.spec.percentiles,
      thresholds: run.spec.thresholds, horizons: run.spec.horizons, engineVersion: result.engineVersion, inputHash: result.inputHash,
      resultHash: result.resultHash, exportedBy: "b", exportedAt: new Date(0).toISOString(), statements: [],
    } as WorkbookManifest;
    const book = new ExcelJS.Workbook();
    await book.xlsx.load((await buildRunWorkbook(manifest, tweaked, run.spec.model, { kind: "omitted", reason: "not part of this test" })) as unknown as ArrayBuffer);
    const sheet = book.getWorksheet("Exceedance")!;
    const column = (sheet.getRow(2).values as unknown[]).indexOf("p_exceed_2K");
    shown.forEach(([v, text], k) => {
      const cell = sheet.getRow(3 + i - k).getCell(column);
      expect(cell.value).toBe(v);
      expect(SSF.format(cell.numFmt, cell.value as number)).toBe(text);
    });
    // Every probability cell on every sheet reads as a percentage.
    for (const ws of book.worksheets) {
      const header = (ws.getRow(2).values as unknown[]).map(String);
      header.forEach((name, c) => {
        if (!/^(p_exceed_|share_)/.test(name)) return;
        ws.getColumn(c).eachCell((cell, r) => {
          if (r > 2 && typeof cell.value === "number") expect(SSF.format(cell.numFmt, cell.value)).toMatch(/^(< 0\.1%|> 99\.9%|\d{1,3}\.\d%)$/);
        });
      });
    }
  });
});
