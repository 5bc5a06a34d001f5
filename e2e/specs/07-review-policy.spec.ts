import { expect, test } from "@playwright/test";
import { demoUsers } from "../support/demo-users";
import { names, seededVersionName } from "../support/names";
import { openFromNav } from "../support/navigation";
import { pathwayIds, type VersionSummary } from "../support/runs";
import { snap } from "../support/screenshots";
import { apiAs, getJson, postJson, signIn } from "../support/sign-in";

interface Version { id: string; name: string; status: string; model: { climate: Record<string, unknown> }; defaults: unknown; notes: string; pathwayIds: string[] }

/**
 * The materiality policy end to end: the analyst files a draft that moves the outputs as a
 * minor change and is refused, naming each threshold that fired; re-classed as major it files;
 * the reviewer sees the same firings on two pinned pathways (and can narrow the preview), and
 * rejects it with a reason, which the analyst finds on her desk. Last, the admin changes the
 * thresholds with a reason, and the audit log keeps it.
 */
test.describe.configure({ mode: "serial" });

let draft: Version;

test.beforeAll(async ({ baseURL }) => {
  // Set-up through the API (the editor itself is covered by 01): the approved version with a
  // higher ECS median, pinned to two seeded pathways to keep the preview short.
  const api = await apiAs("analyst", baseURL!);
  const parent = (await getJson<{ items: VersionSummary[] }>(api, "/api/model-versions?status=approved")).items.find((v) => v.name === seededVersionName)!;
  const full = await getJson<Version>(api, `/api/model-versions/${parent.id}`);
  draft = await postJson<Version>(api, "/api/model-versions", {
    name: names.hotterDraft,
    parentId: full.id,
    pathwayIds: await pathwayIds(api, ["Harbourline Middle", "Harbourline High"]),
    model: { ...full.model, climate: { ...full.model.climate, ecs: { type: "range", p50: 4, low: 2.5, high: 6.5, coverage: 90, shape: "lognormal" } } },
    defaults: full.defaults,
    notes: `${full.notes}\n- Trial: ECS median 4 K (2.5–6.5 K, 5–95 %).`,
  });
  await api.dispose();
});

test("a minor filing over a threshold is refused, names what fired, and files as major", async ({ page }, testInfo) => {
  await signIn(page, "analyst");
  await page.goto(`/model-versions/${draft.id}`);
  await expect(page.getByRole("heading", { level: 1, name: new RegExp(`^${names.hotterDraft} v\\d+$`) })).toBeVisible();
  await page.getByRole("radio", { name: /^Minor/ }).check();
  await page.getByRole("button", { name: "Submit for review" }).click();
  await expect(page.getByRole("button", { name: "Checking materiality…" })).toBeVisible();
  const refusal = page.getByRole("alert").filter({ hasText: "Not a minor change under the firm's materiality policy" });
  await expect(refusal).toBeVisible({ timeout: 60_000 });
  await expect(refusal).toContainText(/fired: median shift \+\d\.\d\d K > 0\.1 K on Harbourline Middle 2100/);
  await expect(refusal).toContainText(/on Harbourline High/);
  await refusal.scrollIntoViewIfNeeded();
  await snap(page, testInfo, "minor-refused", "materiality-refused.png");
  // Still a draft: nothing was filed.
  await expect(page.getByText("Model version draft")).toBeVisible();

  await refusal.getByRole("button", { name: "Class as major" }).click();
  await expect(page.getByRole("radio", { name: /^Major/ })).toBeChecked();
  await page.getByLabel("Note to the reviewer (optional)").fill("ECS median to 4 K: a material change, for full validation.");
  await page.getByRole("button", { name: "Submit for review" }).click();
  await expect(page.getByText("Model version in review")).toBeVisible();
});

test("the reviewer sees which thresholds fired on every pinned pathway, and rejects with a reason", async ({ page }, testInfo) => {
  await signIn(page, "manager");
  await page.goto(`/model-versions/${draft.id}/review`);
  await expect(page.getByRole("heading", { level: 1, name: new RegExp(`^${names.hotterDraft} v\\d+$`) })).toBeVisible();
  const materiality = page.getByRole("region", { name: "Materiality" });
  await expect(materiality).toBeVisible({ timeout: 60_000 });
  await expect(materiality).toContainText("the change is classed as major");
  await expect(materiality.getByRole("listitem").filter({ hasText: /fired: median shift .* on Harbourline Middle 2100/ })).toBeVisible();
  await expect(materiality.getByRole("listitem").filter({ hasText: /on Harbourline High/ }).first()).toBeVisible();
  await expect(page.getByRole("heading", { level: 3 })).toHaveText(["On Harbourline Middle", "On Harbourline High"]);
  await expect(page.getByText(/2,000 members per version/)).toBeVisible();
  await snap(page, testInfo, "review-materiality", "review-materiality.png");

  // The picker narrows the preview to one pathway on request.
  await page.getByRole("checkbox", { name: "Harbourline High" }).uncheck();
  await page.getByRole("button", { name: "Preview on these" }).click();
  await expect(page.getByRole("heading", { level: 3 })).toHaveText(["On Harbourline Middle"], { timeout: 60_000 });

  const reason = "ECS median 4 K is outside the assessed likely range's centre; bring the evidence for it first.";
  await page.getByLabel("Comment").fill(reason);
  await page.getByRole("button", { name: "Reject" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Rejected." })).toBeVisible();
});

test("the rejected author finds the reason on her desk, with a way to the version", async ({ page }, testInfo) => {
  await signIn(page, "analyst");
  const card = page.getByRole("region", { name: "Returned to you" });
  await expect(card).toBeVisible();
  await expect(card).toContainText(`Rejected by ${demoUsers.manager.name}`);
  await expect(card).toContainText("bring the evidence for it first");
  await snap(page, testInfo, "desk-returned", "desk-returned.png");
  await card.getByRole("link", { name: new RegExp(`^${names.hotterDraft} v\\d+$`) }).click();
  await expect(page).toHaveURL(new RegExp(`/model-versions/${draft.id}$`));
});

test("the admin changes the thresholds with a reason, and the audit log keeps it", async ({ page }) => {
  await signIn(page, "admin");
  await openFromNav(page, "Admin");
  await page.getByRole("navigation", { name: "Admin" }).getByRole("link", { name: "Review policy" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Review policy" })).toBeVisible();
  await expect(page.getByLabel("Median shift (K)")).toHaveValue("0.1");
  await page.getByLabel("Median shift (K)").fill("0.15");
  await page.getByRole("button", { name: "Save thresholds" }).click();
  await expect(page.getByText("must be at least 3 characters")).toBeVisible();
  const reason = "Board review: a tenth of a kelvin flagged routine recalibrations.";
  await page.getByLabel("Reason for the change").fill(reason);
  await page.getByRole("button", { name: "Save thresholds" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Saved" })).toBeVisible();

  await page.getByRole("navigation", { name: "Admin" }).getByRole("link", { name: "Audit log" }).click();
  await page.getByLabel("Action").fill("settings.materiality-changed");
  await page.getByRole("button", { name: "Filter" }).click();
  const row = page.getByRole("row").filter({ hasText: "settings.materiality-changed" });
  await expect(row).toContainText("median 0.1 K");
  await expect(row).toContainText("median 0.15 K");
  await expect(row).toContainText(reason);
});
