import { expect, test } from "@playwright/test";
import { members, names, seededPathways, seededVersionName } from "../support/names";
import { openFromNav } from "../support/navigation";
import { pick, pickEach } from "../support/pickers";
import { chooseVersion, pathwayIds, runIdFromUrl, waitForRun, type RunResult, type RunSummary, type VersionSummary } from "../support/runs";
import { snap } from "../support/screenshots";
import { apiAs, getJson, postJson, signIn } from "../support/sign-in";

/**
 * Analyst: runs an ensemble on the newly approved version, watches it progress, reads the
 * fan chart and horizon table, and compares it with the same pathways under the previous
 * version. Also checks that a run on an unapproved version is marked exploratory.
 */
test.describe.configure({ mode: "serial" });

const seed = "e2e-orsa-2025";

test.beforeAll(async ({ baseURL }) => {
  // The previous version's run to compare against: same pathways, members and seed.
  const api = await apiAs("analyst", baseURL!);
  const v1 = (await getJson<{ items: VersionSummary[] }>(api, "/api/model-versions?status=approved")).items.find(
    (v) => v.name === seededVersionName,
  )!;
  const run = await postJson<RunSummary>(api, "/api/runs", {
    name: names.runOnPrevious,
    modelVersionId: v1.id,
    pathwayIds: await pathwayIds(api, seededPathways),
    members,
    seed,
    sampling: "latin-hypercube",
  });
  // A third run for the comparison: the same version and pathways under another seed, so the
  // settings table has one more difference to name.
  const other = await postJson<RunSummary>(api, "/api/runs", {
    name: names.runOnPreviousOtherSeed,
    modelVersionId: v1.id,
    pathwayIds: await pathwayIds(api, seededPathways),
    members,
    seed: `${seed}-other`,
    sampling: "latin-hypercube",
  });
  await waitForRun(api, run.id);
  await waitForRun(api, other.id);
  await api.dispose();
});

test("analyst runs the approved version, reads the fan chart and horizons, compares with v1", async ({ page }, testInfo) => {
  await signIn(page, "analyst");
  await openFromNav(page, "Runs");
  await page.getByRole("link", { name: "New run" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "New run" })).toBeVisible();

  await page.getByLabel("Name (optional)").fill(names.runOnWider);
  await chooseVersion(page, names.widerDraft);
  await expect(page.getByText(/will be exploratory/)).toHaveCount(0);
  await pickEach(page, "Pathways", seededPathways);
  await page.getByLabel("Members").fill(String(members));
  await page.getByLabel("Seed").fill(seed);
  await page.getByRole("radio", { name: "Latin hypercube" }).check();
  await snap(page, testInfo, "run-form", "run-form.png");
  await page.getByRole("button", { name: "Queue run" }).click();

  // Progress: the page follows the run by itself (no reload) from queued/running to the result.
  await expect(page).toHaveURL(/\/runs\/[0-9a-f-]{36}$/);
  const runId = runIdFromUrl(page.url());
  const progress = page.getByRole("progressbar", { name: `Progress of ${names.runOnWider}` });
  const fan = page.getByRole("figure", { name: "Warming above 1850–1900 (K)" });
  await expect(progress.or(fan)).toBeVisible();
  if (await progress.isVisible()) {
    testInfo.annotations.push({ type: "progress", description: `progress bar seen at ${await progress.getAttribute("aria-valuenow")}` });
    await snap(page, testInfo, "run-in-progress");
  }
  await expect(fan).toBeVisible({ timeout: 90_000 });
  await expect(progress).toHaveCount(0);
  await expect(page.getByText("Made with an approved model version.")).toBeVisible();
  await expect(page.getByRole("complementary", { name: "Cautions" })).toBeVisible();

  // The fan chart draws the focused pathway's band pair and median, and only the median of each
  // other pathway (their bands behind a toggle), with a show/hide button per pathway.
  for (const p of seededPathways) await expect(fan.getByRole("button", { name: p, exact: true })).toHaveAttribute("aria-pressed", "true");
  expect(await fan.locator("svg path").count()).toBeGreaterThanOrEqual(3 + (seededPathways.length - 1));
  await snap(page, testInfo, "run-result", "run-result.png");
  const plot = fan.getByRole("img");
  const box = (await plot.boundingBox())!;
  await plot.hover({ position: { x: box.width * 0.8, y: box.height * 0.5 } });
  // Hover read-out of the year's percentiles for every pathway shown.
  await expect(fan.getByText(/^median/).first()).toBeVisible();
  await snap(page, testInfo, "run-result-hover");

  // The horizon table shows what the API computed (2 decimals, K).
  const api = page.request;
  const result = (await (await api.get(`/api/runs/${runId}/result`)).json()) as RunResult;
  const highTab = page.getByRole("radiogroup", { name: "Pathway" }).getByRole("radio", { name: "Harbourline High" });
  await highTab.click();
  await expect(highTab).toHaveAttribute("aria-checked", "true");
  const table = page.getByRole("table", { name: "Warming percentiles at the horizons for Harbourline High" });
  const high = result.pathways.find((p) => p.name === "Harbourline High")!;
  for (const year of [2050, 2100]) {
    const t = high.horizons.find((h) => h.year === year)!.temperature;
    const row = table.getByRole("row", { name: new RegExp(`^${year} `) });
    await expect(row.getByRole("cell").nth(0)).toHaveText(new RegExp(`^${t.p5!.toFixed(2)}`));
    await expect(row.getByRole("cell").nth(2)).toHaveText(new RegExp(`^${t.p50!.toFixed(2)}`));
    await expect(row.getByRole("cell").nth(4)).toHaveText(new RegExp(`^${t.p95!.toFixed(2)}`));
  }
  await table.scrollIntoViewIfNeeded();
  await snap(page, testInfo, "run-horizons-high");

  // Compare with the previous version: same pathways, same seed, wider aerosol–cloud range.
  await page.getByRole("link", { name: "Compare…" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Compare" })).toBeVisible();
  // The address carries the run ids; this run is the reference.
  await expect(page).toHaveURL(/\/runs\/compare\?runs=[0-9a-f-]{36}$/);
  await pick(page, "Run 2", names.runOnPrevious);
  await page.getByLabel("Reference run: pathway").selectOption({ label: "Harbourline High" });
  await page.getByLabel("Run 2: pathway").selectOption({ label: "Harbourline High" });
  await expect(page.getByRole("figure", { name: `${names.runOnWider}: Harbourline High` })).toBeVisible();
  await expect(page.getByRole("figure", { name: `${names.runOnPrevious}: Harbourline High` })).toBeVisible();
  await expect(page.getByRole("figure", { name: "All on one chart" })).toBeVisible();
  await expect(page.getByRole("figure", { name: "Warming at the shared horizons" })).toBeVisible();
  await expect(page.getByTestId("differing-settings")).toHaveText("Differ: model version.");
  await snap(page, testInfo, "compare-versions", "compare.png");

  // A third run: rows are labelled by run name, with differences from the reference.
  await page.getByRole("button", { name: "Add a run" }).click();
  await pick(page, "Run 3", names.runOnPreviousOtherSeed);
  await page.getByLabel("Run 3: pathway").selectOption({ label: "Harbourline High" });
  await expect(page).toHaveURL(/\?runs=[0-9a-f-]{36},[0-9a-f-]{36},[0-9a-f-]{36}&pathways=/);
  await expect(page.getByTestId("differing-settings")).toHaveText("Differ: model version, seed.");
  const table2100 = page.getByRole("table", { name: "Warming in 2100" });
  await expect(table2100.getByRole("rowheader")).toHaveText([
    `${names.runOnWider} (reference)`,
    names.runOnPrevious,
    names.runOnPreviousOtherSeed,
  ]);
  // Δ median of the third run: a signed difference in K.
  await expect(table2100.getByRole("row").nth(3).getByRole("cell").nth(2)).toHaveText(/^[+−]\d\.\d\d$|^0\.00$/);
  await page.getByRole("heading", { name: "Settings that differ" }).scrollIntoViewIfNeeded();
  await snap(page, testInfo, "compare-three-runs", "compare-three-runs.png");
});

test("a run on an unapproved version is marked exploratory on its page and on the desk", async ({ page, baseURL }, testInfo) => {
  // The seeded v2 draft (a trial 2001–2020 observational constraint) is not approved: any run of it is exploratory.
  const api = await apiAs("analyst", baseURL!);
  const draft = (await getJson<{ items: VersionSummary[] }>(api, "/api/model-versions?status=draft")).items.find(
    (v) => v.name === seededVersionName,
  )!;
  const run = await postJson<RunSummary>(api, "/api/runs", {
    name: "Constraint trial (draft v2)",
    modelVersionId: draft.id,
    pathwayIds: await pathwayIds(api, ["Harbourline Middle"]),
    members: 2000,
    seed: "e2e-draft",
    sampling: "latin-hypercube",
  });
  expect(run.exploratory).toBe(true);
  await waitForRun(api, run.id);
  await api.dispose();

  await signIn(page, "analyst");
  await expect(page.getByRole("heading", { name: "Exploratory results" })).toBeVisible();
  const flagged = page.getByRole("listitem").filter({ has: page.getByRole("link", { name: "Constraint trial (draft v2)" }) });
  await expect(flagged.first()).toContainText("Exploratory");
  await snap(page, testInfo, "desk-exploratory");
  await page.goto(`/runs/${run.id}`);
  await expect(page.getByText(/EXPLORATORY/).first()).toBeVisible();
  await expect(page.getByText(/Do not use for filings/)).toBeVisible();
  await expect(page.getByRole("heading", { name: "Observational constraint" })).toBeVisible();
  await snap(page, testInfo, "run-exploratory", "run-exploratory.png");
});
