import { expect, test, type Page } from "@playwright/test";
import { snap } from "../support/screenshots";
import { signIn } from "../support/sign-in";

/**
 * Forms never lose work: an analyst starts a model version, tries to leave (the app asks),
 * reloads (the draft comes back with its time), then discards it on the way out; the actuary's
 * peril-profile editor asks the same and lays out at 1280 and 1440 px.
 */
test.describe.configure({ mode: "serial" });

test("the model-version editor asks before leaving, keeps a draft across a reload, and forgets it when discarded", async ({
  page,
}, testInfo) => {
  await signIn(page, "analyst");
  await page.goto("/model-versions/new");
  await expect(page.getByRole("heading", { level: 1, name: "New model version" })).toBeVisible();
  const name = page.getByRole("textbox", { name: "Name" });
  await name.fill("Unsaved tail study");

  // Leaving through the navigation is held until the person chooses.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Runs", exact: true }).click();
  const dialog = page.getByRole("alertdialog", { name: "Leave without saving?" });
  await expect(dialog).toBeVisible();
  await snap(page, testInfo, "leave-confirm");
  await dialog.getByRole("button", { name: "Keep editing" }).click();
  await expect(dialog).toHaveCount(0);
  await expect(page).toHaveURL(/\/model-versions\/new$/);
  await expect(name).toHaveValue("Unsaved tail study");

  // A reload: the browser's own prompt is accepted, and the draft comes back with its time in UTC.
  page.once("dialog", (d) => void d.accept());
  await page.reload();
  await expect(page.getByText(/^Restored unsaved draft from \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC\.$/)).toBeVisible();
  await expect(page.getByRole("textbox", { name: "Name" })).toHaveValue("Unsaved tail study");
  await snap(page, testInfo, "restored-draft");

  // Discarding on the way out leaves, and the next visit starts clean.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Runs", exact: true }).click();
  await page.getByRole("alertdialog").getByRole("button", { name: "Discard changes and leave" }).click();
  await expect(page).toHaveURL(/\/runs$/);
  await page.goto("/model-versions/new");
  await expect(page.getByRole("textbox", { name: "Name" })).not.toHaveValue("Unsaved tail study");
  await expect(page.getByText(/Restored unsaved draft/)).toHaveCount(0);
});

for (const width of [1280, 1440]) {
  test(`the peril-profile editor lays out at ${width} px and asks before leaving`, async ({ page }, testInfo) => {
    await page.setViewportSize({ width, height: 900 });
    await signIn(page, "actuary");
    await page.goto("/peril-lens/profiles/new");
    const name = page.getByRole("textbox", { name: "Name" });
    await expect(name).toBeVisible();
    // The Name box has room for a real name, and no label wraps to one word per line.
    expect((await name.boundingBox())!.width).toBeGreaterThanOrEqual(240);
    const baseline = page.getByText("Warming already in the risk view (K above 1850–1900)");
    expect((await baseline.boundingBox())!.height).toBeLessThanOrEqual(44);
    await expectSelectsFit(page);
    await snap(page, testInfo, `peril-profile-editor-${width}`);
    await page.getByRole("radio", { name: "Tables by warming level and return period" }).click();
    await expectSelectsFit(page);
    await snap(page, testInfo, `peril-profile-editor-tables-${width}`);

    await name.fill("Hail, Eastvale (unsaved)");
    await leaveAndDiscard(page);
  });
}

async function leaveAndDiscard(page: Page) {
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Desk", exact: true }).click();
  await expect(page.getByRole("alertdialog", { name: "Leave without saving?" })).toBeVisible();
  await page.getByRole("button", { name: "Discard changes and leave" }).click();
  await expect(page).not.toHaveURL(/profiles\/new/);
}

/** Every select shows its chosen option whole and stays inside its card. */
async function expectSelectsFit(page: Page) {
  for (const select of await page.locator("main select").all()) {
    const fits = await select.evaluate((el: HTMLSelectElement) => {
      const option = el.selectedOptions[0]?.textContent ?? "";
      const probe = document.createElement("span");
      probe.style.font = getComputedStyle(el).font;
      probe.textContent = option;
      document.body.append(probe);
      const textWidth = probe.getBoundingClientRect().width;
      probe.remove();
      const card = el.closest("section")?.getBoundingClientRect();
      const box = el.getBoundingClientRect();
      // Room for the text plus the padding and the arrow (about 40 px), inside the card.
      return textWidth + 40 <= box.width && (!card || box.right <= card.right);
    });
    expect(fits, `the select showing "${await select.evaluate((el: HTMLSelectElement) => el.selectedOptions[0]?.textContent)}" fits`).toBe(
      true,
    );
  }
}
