import { expect, test } from "@playwright/test";
import { demoUsers } from "../support/demo-users";
import { names } from "../support/names";
import { openFromNav } from "../support/navigation";
import { snap } from "../support/screenshots";
import { signIn } from "../support/sign-in";

/**
 * Admin: invites a colleague, changes their role with a reason, then reads the audit log (the role change,
 * the earlier flows' decisions) and the mails the app sent (invitation, review request,
 * decision, finished runs) in the outbox.
 */
test("admin changes a role, reads the audit log and the outbox", async ({ page }, testInfo) => {
  const newcomer = names.invitedUser;
  await signIn(page, "admin");
  await openFromNav(page, "Admin");
  await expect(page.getByRole("heading", { level: 1, name: "Users and roles" })).toBeVisible();

  await page.getByRole("textbox", { name: "Email" }).fill(newcomer.email);
  await page.getByRole("textbox", { name: "Name" }).fill(newcomer.name);
  await page.getByRole("combobox", { name: "Role", exact: true }).selectOption("analyst");
  await page.getByRole("button", { name: "Invite" }).click();
  const role = page.getByRole("combobox", { name: `Role of ${newcomer.name}` });
  await expect(role).toHaveValue("analyst");

  // The role change asks for confirmation and a reason; without one nothing is sent.
  const reason = "Joins the pricing desk; applies approved versions.";
  await role.selectOption("actuary");
  const confirm = page.getByRole("group", { name: `Confirm: change the role of ${newcomer.name}` });
  await expect(confirm).toContainText("from analyst to actuary");
  await confirm.getByRole("button", { name: "Yes, change role" }).click();
  await expect(confirm.getByRole("alert")).toContainText("reason");
  await confirm.getByLabel("Reason (kept in the audit log)").fill(reason);
  await confirm.getByRole("button", { name: "Yes, change role" }).click();
  await expect(confirm).toBeHidden();
  await page.reload();
  await expect(page.getByRole("combobox", { name: `Role of ${newcomer.name}` })).toHaveValue("actuary");
  // An admin is not offered a change of their own role (no one grants or removes their own rights).
  const ownRow = page.getByRole("row").filter({ hasText: demoUsers.admin.email });
  await expect(ownRow).toContainText("admin (you)");
  await expect(page.getByRole("combobox", { name: `Role of ${demoUsers.admin.name}` })).toHaveCount(0);
  await snap(page, testInfo, "admin-users", "admin-users.png");

  // Audit log: the role change, filtered by its action.
  const adminNav = page.getByRole("navigation", { name: "Admin" });
  await adminNav.getByRole("link", { name: "Audit log" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Audit log" })).toBeVisible();
  await expect(page.getByRole("cell", { name: "model-version.approved" }).first()).toBeVisible();
  await snap(page, testInfo, "admin-audit", "admin-audit.png");
  // The filter applies itself once typing pauses, and lands in the URL (a shareable, reloadable view).
  await page.getByLabel("Action").fill("user.role-changed");
  await expect(page).toHaveURL(/action=user\.role-changed/);
  const roleChange = page.getByRole("row").filter({ hasText: "user.role-changed" }).filter({ hasText: newcomer.email });
  await expect(roleChange).toContainText("from analyst to actuary");
  await expect(roleChange).toContainText(reason);
  await expect(page.getByRole("row").filter({ hasText: "model-version.approved" })).toHaveCount(0);

  // Outbox: the invitation, the review request to the managers, the decision to the author.
  await adminNav.getByRole("link", { name: "Outbox" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Outbox" })).toBeVisible();
  // The invitation carries a link to set a password, never a password.
  await page.getByRole("button", { name: new RegExp(`^You are invited to Plumeline.*to ${newcomer.email}`) }).click();
  await expect(page.getByText(/\/reset-password\?token=/).first()).toBeVisible();
  await expect(page.getByText(/password:/)).toHaveCount(0);
  await expect(page.getByRole("button", { name: new RegExp(`^Review requested: ${names.widerDraft}.*to ${demoUsers.manager.email}`) })).toBeVisible();
  await expect(page.getByRole("button", { name: new RegExp(`^Run finished: ${names.runOnWider}`) })).toBeVisible();
  const decision = page.getByRole("button", { name: new RegExp(`^Model version approved: ${names.widerDraft}.*to ${demoUsers.analyst.email}`) });
  await decision.click();
  await expect(page.getByText(/Approved as a stress variant/).first()).toBeVisible();
  await snap(page, testInfo, "admin-outbox", "admin-outbox.png");
});
