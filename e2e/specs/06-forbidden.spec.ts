import { expect, test } from "@playwright/test";
import { names } from "../support/names";
import { snap } from "../support/screenshots";
import { signIn } from "../support/sign-in";
import type { VersionSummary } from "../support/runs";

/**
 * A user without the permission who opens a page by its URL is told why, visibly, instead
 * of getting a broken page — and the API refuses the same thing with 403.
 */
test("an actuary at an admin URL is refused with the reason; the API says 403", async ({ page }, testInfo) => {
  await signIn(page, "actuary");
  await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Admin" })).toHaveCount(0);
  await page.goto("/admin/users");
  await expect(page.getByRole("heading", { level: 1, name: "Managing users and roles needs the admin role" })).toBeVisible();
  await expect(page.getByText("Not available to your role")).toBeVisible();
  await expect(page.getByRole("main")).toContainText("You are signed in as actuary");
  await expect(page.getByRole("link", { name: "Back to your desk" })).toBeVisible();
  await expect(page.getByRole("combobox", { name: /^Role of / })).toHaveCount(0);
  await snap(page, testInfo, "forbidden-admin-users", "forbidden.png");
  const api = await page.request.get("/api/users");
  expect(api.status()).toBe(403);
});

test("an analyst at a review URL is refused: deciding is the manager's", async ({ page }, testInfo) => {
  await signIn(page, "analyst");
  const { items: versions } = await (await page.request.get("/api/model-versions?limit=200")).json() as { items: VersionSummary[] };
  const wider = versions.find((v) => v.name === names.widerDraft)!;
  await page.goto(`/model-versions/${wider.id}/review`);
  await expect(page.getByRole("heading", { level: 1, name: "Approving model versions needs the manager role" })).toBeVisible();
  await expect(page.getByRole("button", { name: "Approve" })).toHaveCount(0);
  await snap(page, testInfo, "forbidden-review");
});

test("a visitor who is not signed in is sent to sign in, then back to the page", async ({ page }) => {
  await page.goto("/admin/audit");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fadmin%2Faudit/);
  await expect(page.getByRole("heading", { level: 1, name: "Sign in" })).toBeVisible();
  await page.getByLabel("Email").fill("manager@harbourline.example");
  await page.getByLabel("Password").fill("plume-demo-manager");
  await page.getByRole("button", { name: "Sign in" }).click();
  // A manager may read the audit log (audit:read), so the page opens.
  await expect(page.getByRole("heading", { level: 1, name: "Audit log" })).toBeVisible();
});
