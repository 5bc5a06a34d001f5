import { expect, test, type APIRequestContext } from "@playwright/test";
import { demoUsers } from "../support/demo-users";
import { names, seededVersionName } from "../support/names";
import { openFromNav } from "../support/navigation";
import { snap } from "../support/screenshots";
import { apiAs, getJson, postJson, signIn } from "../support/sign-in";

interface User { id: string; email: string; role: string }
interface Version { id: string; name: string; status: string; versionNumber: number; model: unknown; defaults: unknown; notes: string; authorId: string; pathwayIds: string[] }

/**
 * Manager: finds the analyst's submission on the desk, reads the diff, cannot decide on a
 * version of their own, and approves the analyst's with a comment.
 *
 * No role both drafts and decides (docs/API.md: model-versions:write is the analyst's,
 * model-versions:decide the manager's), so a manager-authored version only exists when a
 * person changes role. That is what the setup does, through the API as the admin would:
 * Marit is made an analyst, drafts and submits a minor change, and is made a manager again.
 * Separation of duties must still hold for her own version.
 */
test.describe.configure({ mode: "serial" });

let ownDraft: Version;

test.beforeAll(async ({ baseURL }) => {
  const admin = await apiAs("admin", baseURL!);
  const users = await getJson<User[]>(admin, "/api/users");
  const marit = users.find((u) => u.email === demoUsers.manager.email)!;
  const setRole = async (role: string) => expect((await admin.patch(`/api/users/${marit.id}`, { data: { role, reason: "Review flow: the author may not approve their own draft." } })).status()).toBe(200);

  await setRole("analyst");
  let asMarit: APIRequestContext | undefined;
  try {
    asMarit = await apiAs("manager", baseURL!);
    const parent = (await getJson<{ items: Version[] }>(asMarit, "/api/model-versions?status=approved")).items.find((v) => v.name === seededVersionName)!;
    const full = await getJson<Version>(asMarit, `/api/model-versions/${parent.id}`);
    const draft = await postJson<Version>(asMarit, "/api/model-versions", {
      name: names.managerOwnDraft,
      parentId: full.id,
      pathwayIds: full.pathwayIds,
      model: full.model,
      defaults: { ...(full.defaults as object), horizons: [2030, 2050, 2080, 2100] },
      notes: `${full.notes}\n- Adds 2080 as a default horizon (drafted by Marit while she held the analyst role).`,
    });
    ownDraft = await postJson<Version>(asMarit, `/api/model-versions/${draft.id}/submit`, { changeClass: "minor", note: "Adds a 2080 horizon." });
  } finally {
    await setRole("manager");
    await asMarit?.dispose();
    await admin.dispose();
  }
  expect(ownDraft.status).toBe("in-review");
});

test("manager reads the diff, cannot decide their own version, approves the analyst's", async ({ page }, testInfo) => {
  await signIn(page, "manager");

  // The desk lists what waits for review: the analyst's submission, and her own marked as
  // one another manager decides.
  await expect(page.getByRole("heading", { name: "Waiting for your review" })).toBeVisible();
  const item = page.getByRole("listitem").filter({ hasText: names.widerDraft });
  await expect(item).toContainText("major change by Ines Calloway");
  const own = page.getByRole("listitem").filter({ hasText: names.managerOwnDraft });
  await expect(own).toContainText("another manager decides");
  await snap(page, testInfo, "desk-manager", "desk-manager.png");

  // Her own version: the review page explains why she cannot decide, and the API refuses.
  await openFromNav(page, "Model versions");
  // A segmented filter (buttons with role radio): its state follows the URL, so click and wait.
  const inReview = page.getByRole("radio", { name: "in review" });
  await inReview.click();
  await expect(inReview).toHaveAttribute("aria-checked", "true");
  await page.getByRole("link", { name: names.managerOwnDraft }).click();
  await expect(page.getByRole("heading", { level: 1, name: new RegExp(`^${names.managerOwnDraft} v\\d+$`) })).toBeVisible();
  await page.goto(`/model-versions/${ownDraft.id}/review`);
  await expect(page.getByRole("note")).toContainText("You are the author of this version");
  await expect(page.getByRole("button", { name: "Approve" })).toBeDisabled();
  await expect(page.getByRole("button", { name: "Reject" })).toBeDisabled();
  await expect(page.getByText(/Running two .*preview ensembles/)).toHaveCount(0, { timeout: 60_000 });
  await snap(page, testInfo, "review-own-version-refused", "review-own-version.png");
  // The buttons are only the visible half: the server refuses the same request from this session.
  const refused = await page.request.post(`/api/model-versions/${ownDraft.id}/approve`, {
    data: { comment: "approving my own" },
    headers: { Origin: new URL(page.url()).origin },
  });
  expect(refused.status()).toBe(403);
  expect((await refused.json()).error.code).toBe("self_approval_forbidden");

  // The analyst's version: read the diff, approve with a comment.
  await openFromNav(page, "Desk");
  await item.getByRole("link", { name: "Review" }).click();
  await expect(page.getByRole("heading", { level: 1, name: new RegExp(`^${names.widerDraft} v\\d+$`) })).toBeVisible();
  const diff = page.getByRole("table", { name: /^Against Harbourline Core Assumptions v1/ });
  await expect(diff.getByRole("row", { name: /aerosol-cloud\.scale\.low 0\.298 0\.1/ })).toBeVisible();
  await expect(diff.getByRole("row", { name: /aerosol-cloud\.scale\.high 1\.726 2/ })).toBeVisible();
  await expect(diff.getByRole("row", { name: /^pathwayIds/ })).toHaveCount(0);
  // The page also runs a small preview ensemble of both versions ("effect on key outputs").
  await expect(page.getByText(/Running two .*preview ensembles/)).toHaveCount(0, { timeout: 60_000 });
  await snap(page, testInfo, "review-diff", "review-diff.png");

  await page.getByLabel("Comment").fill("Approved as a stress variant: only the aerosol–cloud range differs from v1, and the notes say why.");
  await page.getByRole("button", { name: "Approve" }).click();
  await expect(page.getByText(/approved/i).first()).toBeVisible();
  await expect(page.getByRole("button", { name: "Approve" })).toHaveCount(0);
  await snap(page, testInfo, "review-approved");

  // The list now shows it approved, decided by this manager.
  await openFromNav(page, "Model versions");
  const row = page.getByRole("table", { name: "Model versions" }).getByRole("row").filter({ hasText: names.widerDraft });
  await expect(row).toContainText("approved");
  await expect(row).toContainText(demoUsers.manager.name);
});
