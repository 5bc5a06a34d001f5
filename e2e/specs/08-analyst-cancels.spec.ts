import { expect, test } from "@playwright/test";
import { names, seededVersionName } from "../support/names";
import { pathwayIds, type RunSummary, type VersionSummary } from "../support/runs";
import { snap } from "../support/screenshots";
import { apiAs, getJson, postJson, signIn } from "../support/sign-in";

interface AuditPage { items: Array<{ action: string; entityId: string | null }>; total: number }

/**
 * Analyst cancels a long run: the action asks for confirmation, answers "Cancelling…" at once,
 * then shows the run cancelled once the worker has stopped; a second cancel changes nothing
 * and writes no second audit row.
 */
test("analyst cancels a large run: confirmation, cancelling…, cancelled; a second cancel changes nothing", async ({ page, baseURL }, testInfo) => {
  // A run long enough to catch while it runs: 500,000 members on four pathways (tens of seconds on one core).
  const api = await apiAs("analyst", baseURL!);
  const v1 = (await getJson<{ items: VersionSummary[] }>(api, "/api/model-versions?status=approved")).items.find((v) => v.name === seededVersionName)!;
  const run = await postJson<RunSummary>(api, "/api/runs", {
    name: names.runToCancel,
    modelVersionId: v1.id,
    pathwayIds: await pathwayIds(api, ["Harbourline Low", "Harbourline Middle", "Harbourline High", "Harbourline Middle (gas concentrations)"]),
    members: 500_000,
    seed: "e2e-cancel",
    sampling: "monte-carlo",
  });
  await expect.poll(async () => (await getJson<RunSummary>(api, `/api/runs/${run.id}`)).status, { timeout: 60_000 }).toBe("running");

  await signIn(page, "analyst");
  await page.goto(`/runs/${run.id}`);
  await expect(page.getByRole("heading", { level: 1, name: names.runToCancel })).toBeVisible();
  await page.getByRole("button", { name: "Cancel run" }).click();
  const confirm = page.getByRole("group", { name: `Confirm: cancel ${names.runToCancel}` });
  await expect(confirm).toContainText("The members computed so far are discarded");
  // A slow answer from the server must not leave the button looking idle: hold the cancel request a moment.
  await page.route(`**/api/runs/${run.id}/cancel`, async (route) => {
    await new Promise((resolve) => setTimeout(resolve, 1_000));
    await route.continue();
  });
  await confirm.getByRole("button", { name: "Yes, cancel the run" }).click();
  await expect(page.getByRole("button", { name: "Cancelling…" })).toBeDisabled();
  await snap(page, testInfo, "run-cancelling");
  await expect(page.getByText("This run was cancelled before it finished.")).toBeVisible({ timeout: 60_000 });
  await expect(page.getByRole("button", { name: /Cancel/ })).toHaveCount(0);
  await snap(page, testInfo, "run-cancelled", "run-cancelled.png");

  // The second cancel answers the current state and changes nothing, in the API and in the audit log.
  const admin = await apiAs("admin", baseURL!);
  const auditOf = async () => (await getJson<AuditPage>(admin, `/api/audit?entityId=${run.id}&limit=50`)).items.map((e) => e.action);
  const before = await auditOf();
  // The owner's request, then the worker's confirmation: one row each.
  expect(before.filter((a) => a === "run.cancel-requested")).toHaveLength(1);
  expect(before.filter((a) => a === "run.cancelled")).toHaveLength(1);
  const again = await api.post(`/api/runs/${run.id}/cancel`);
  expect(again.status()).toBe(200);
  expect((await again.json()).status).toBe("cancelled");
  expect(await auditOf()).toEqual(before);
  await api.dispose();
  await admin.dispose();
});
