import { expect, test } from "@playwright/test";
import { members, names } from "../support/names";
import { openFromNav } from "../support/navigation";
import { pickEach } from "../support/pickers";
import { downloadChart } from "../support/chart-download";
import { pdfPages } from "../support/pdf-text";
import { chooseVersion, runIdFromUrl, type RunResult } from "../support/runs";
import { snap } from "../support/screenshots";
import { signIn } from "../support/sign-in";
import { manifestPairs, readWorkbook, tableRows } from "../support/workbook";

/**
 * Actuary: runs the approved version through the demo peril profiles and portfolio, reads
 * the peril tables, downloads the workbook, and the test reads that file with exceljs: the
 * manifest and the numbers must be the ones the API serves as JSON.
 */
const seed = "e2e-actuary-q3";
const floodProfile = "Heavy-rainfall flood, Northmere Coast";
const heatProfile = "Hot-day frequency, Vellan Basin";

test("actuary applies the peril profiles and portfolio, exports the workbook, which matches the API", async ({ page }, testInfo) => {
  await signIn(page, "actuary");
  await snap(page, testInfo, "desk-actuary");
  await openFromNav(page, "Peril lens");
  await expect(page.getByRole("table", { name: "Peril profiles" }).getByRole("link", { name: floodProfile })).toBeVisible();
  await expect(page.getByRole("table", { name: "Portfolio baselines" })).toContainText("Harbourline Mutual property baseline");
  await snap(page, testInfo, "peril-lens", "peril-lens.png");

  await openFromNav(page, "Runs");
  await page.getByRole("link", { name: "New run" }).click();
  await page.getByLabel("Name (optional)").fill(names.actuaryRun);
  await chooseVersion(page, names.widerDraft);
  await pickEach(page, "Pathways", ["Harbourline Middle", "Harbourline Low"]);
  await page.getByLabel("Members").fill(String(members));
  await page.getByLabel("Seed").fill(seed);
  await pickEach(page, "Peril profiles", [floodProfile, heatProfile]);
  const portfolio = page.getByLabel("Portfolio baseline");
  await expect(portfolio).toBeEnabled();
  const option = portfolio.locator("option").filter({ hasText: "Harbourline Mutual property baseline" });
  await portfolio.selectOption(await option.getAttribute("value"));
  await page.getByRole("button", { name: "Queue run" }).click();

  await expect(page).toHaveURL(/\/runs\/[0-9a-f-]{36}$/);
  const runId = runIdFromUrl(page.url());
  const lens = page.getByRole("region", { name: "Peril lens" });
  await expect(lens).toBeVisible({ timeout: 90_000 });
  await expect(lens.getByRole("complementary", { name: "Peril cautions" })).toContainText("Not a catastrophe model");
  await expect(lens.getByRole("table", { name: `Multipliers — ${floodProfile}` })).toBeVisible();
  await expect(lens.getByRole("table", { name: /^Projected losses — Northmere Coast/ })).toContainText("Average annual loss");
  await lens.evaluate((el) => el.scrollIntoView({ block: "start" }));
  await snap(page, testInfo, "run-peril-lens", "run-peril-lens.png");

  // What the API serves for this run, to hold the workbook against.
  const run = (await (await page.request.get(`/api/runs/${runId}`)).json()) as {
    seed: string;
    members: number;
    manifest: { resultHash: string; engineVersion: string };
  };
  const result = (await (await page.request.get(`/api/runs/${runId}/result`)).json()) as RunResult;

  // The workbook's Members sheet is recomputed from the stored spec before the file is sent:
  // 15–20 s measured on a loaded two-core machine, above the 20 s default wait.
  const downloadStarted = page.waitForEvent("download", { timeout: 90_000 });
  await page.getByRole("link", { name: "Workbook (.xlsx)" }).click();
  const download = await downloadStarted;
  expect(download.suggestedFilename()).toMatch(/\.xlsx$/);
  const file = testInfo.outputPath(download.suggestedFilename());
  await download.saveAs(file);
  const workbook = await readWorkbook(file);

  // Manifest first, naming the approved version, seed, members and the result hash.
  expect(workbook.worksheets[0]!.name).toBe("Manifest");
  const manifest = manifestPairs(workbook);
  expect(manifest.get("Status")).toMatch(/^APPROVED/);
  expect(manifest.get("Model version")).toContain(names.widerDraft);
  expect(manifest.get("Model version status (now)")).toBe("approved");
  expect(manifest.get("Seed")).toBe(seed);
  expect(Number(manifest.get("Members"))).toBe(members);
  expect(run.seed).toBe(seed);
  expect(manifest.get("Result hash")).toBe(run.manifest.resultHash);
  expect(manifest.get("Result hash")).toBe(result.resultHash);
  expect(manifest.get("Engine version")).toBe(run.manifest.engineVersion);

  // A percentile: the 95th of warming in 2100 for the Middle pathway, exactly as in the JSON.
  const middle = result.pathways.find((p) => p.name === "Harbourline Middle")!;
  const h2100 = middle.horizons.find((h) => h.year === 2100)!;
  const horizonRow = tableRows(workbook, "Horizons").find((r) => r.pathway_name === "Harbourline Middle" && r.year === 2100)!;
  expect(horizonRow.temperature_p95_K).toBe(h2100.temperature.p95);
  expect(horizonRow.temperature_p50_K).toBe(h2100.temperature.p50);

  // And a peril figure: median projected AAL of the Northmere flood row in 2050.
  const flood = result.perils!.pathways.find((p) => p.pathwayId === middle.id)!.profiles.find((p) => p.name === floodProfile)!;
  const aal2050 = flood.horizons.find((h) => h.year === 2050)!.losses[0]!.aal;
  const lossRow = tableRows(workbook, "Projected losses").find(
    (r) => r.pathway_name === "Harbourline Middle" && r.profile_name === floodProfile && r.year === 2050 && r.measure === "aal",
  )!;
  expect(lossRow.loss_p50).toBe(aal2050.p50);
  expect(workbook.getWorksheet("Cautions")!.getRow(1).getCell(1).text).toMatch(/^Cautions/);

  // A chart leaves the product with its title, units, legend and a footnote naming the run,
  // the model version and the result hash; its file name names the run and the chart.
  await page.getByRole("radiogroup", { name: "Pathway", exact: true }).getByRole("radio", { name: "Harbourline Middle" }).click();
  const fan = page.getByRole("figure", { name: /^Warming above 1850–1900 \(K\)$/ });
  const chart = await downloadChart(page, fan, testInfo);
  expect(chart.svgName).toBe("plumeline-q3-orsa-flood-and-heat-lens-warming-above-1850-1900-k.svg");
  expect(chart.pngName).toBe("plumeline-q3-orsa-flood-and-heat-lens-warming-above-1850-1900-k.png");
  expect(chart.svg).toContain("Units: K");
  expect(chart.svg).toContain("Harbourline Middle (filled bands)");
  expect(chart.svg).toContain(`Run “${names.actuaryRun}”`);
  expect(chart.svg).toContain(`model version ${names.widerDraft}`);
  expect(chart.svg).toContain(`result hash ${result.resultHash}`);

  // The report: its text, as pdftotext extracts it, holds the result hash and the horizon
  // figures exactly as the run page's horizon table writes them.
  const reportStarted = page.waitForEvent("download", { timeout: 60_000 });
  await page.getByRole("link", { name: "Report (PDF)" }).click();
  const report = await reportStarted;
  expect(report.suggestedFilename()).toMatch(/\.pdf$/);
  const reportFile = testInfo.outputPath(report.suggestedFilename());
  await report.saveAs(reportFile);
  const pages = pdfPages(reportFile);
  const reportText = pages.join("\n");
  expect(reportText).toContain(result.resultHash);
  expect(reportText).toContain(run.manifest.engineVersion);
  const onScreen = page.getByRole("table", { name: "Warming percentiles at the horizons for Harbourline Middle" });
  await expect(onScreen).toBeVisible();
  const section = pages.filter((text) => text.includes("Warming at the horizons — Harbourline Middle")).join("\n");
  expect(section).not.toBe("");
  for (const h of middle.horizons) {
    // The screen's cells: the percentile figure, with the ± of its Monte Carlo interval below it.
    const cells = await onScreen
      .getByRole("row")
      .filter({ has: page.getByRole("rowheader", { name: String(h.year), exact: true }) })
      .getByRole("cell")
      .allInnerTexts();
    const shown = cells.map((c) => c.split("\n")[0]!.trim());
    // The screen writes the API's numbers to two decimals…
    expect(shown[2]).toBe(h.temperature.p50!.toFixed(2));
    // …and the report's row for that year holds the same figures in the same order.
    const row = [String(h.year), ...shown].join(" ");
    expect(section.split("\n"), `report row for ${h.year}`).toContain(row);
  }

  // The export is on record.
  await openFromNav(page, "Exports");
  // Both files are on record: the workbook and, after it, the report.
  const records = page.getByRole("row").filter({ hasText: names.actuaryRun });
  await expect(records.filter({ hasText: /\.xlsx/ }).first()).toBeVisible();
  await expect(records.filter({ hasText: /report\.pdf/ }).first()).toBeVisible();
  await snap(page, testInfo, "exports");
});
