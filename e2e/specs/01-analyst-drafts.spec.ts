import { expect, test } from "@playwright/test";
import { names, seededVersionName } from "../support/names";
import { badPathwayCsv, goodPathwayCsv } from "../support/pathway-csv";
import { openFromNav } from "../support/navigation";
import { snap } from "../support/screenshots";
import { signIn } from "../support/sign-in";

/**
 * Analyst: uploads a pathway (a bad file first: every problem is named by row and column and
 * nothing is saved), then drafts a model version from the approved one with a wider
 * aerosol–cloud range and submits it for review.
 */
test.describe.configure({ mode: "serial" });

test("analyst uploads a pathway; a bad file is refused row by row", async ({ page }, testInfo) => {
  await signIn(page, "analyst");
  await snap(page, testInfo, "desk-analyst");

  await openFromNav(page, "Pathways");
  await expect(page.getByRole("heading", { level: 1, name: "Forcing pathways" })).toBeVisible();
  await page.getByRole("link", { name: /Upload CSV/ }).click();

  // The bad file: the server lists both problems, each with its row and column.
  await page.getByLabel("File").setInputFiles({ name: "broken.csv", mimeType: "text/csv", buffer: Buffer.from(badPathwayCsv()) });
  await page.getByLabel("Name").fill(names.rejectedPathway);
  await page.getByLabel("Vintage").fill("e2e 1");
  await page.getByLabel("Source").fill("Typed by the end-to-end suite");
  await page.getByRole("button", { name: /Check file/ }).click();
  await expect(page.getByText("The file cannot be imported as it is")).toBeVisible();
  await expect(page.getByText(/row 3, column B/)).toBeVisible();
  await expect(page.getByText(/row 5, column A/)).toBeVisible();
  await expect(page.getByRole("button", { name: "Save pathway" })).toHaveCount(0);
  await snap(page, testInfo, "pathway-upload-errors", "pathway-upload-errors.png");

  // The good file: preview first, then save.
  await page.getByLabel("File").setInputFiles({ name: "northmere-stress.csv", mimeType: "text/csv", buffer: Buffer.from(goodPathwayCsv()) });
  await page.getByLabel("Name").fill(names.uploadedPathway);
  await page.getByLabel("Vintage").fill("2025 desk study");
  await page.getByLabel("Source").fill("Invented stress story for the end-to-end suite (not a published scenario)");
  await page.getByRole("button", { name: /Check file/ }).click();
  await expect(page.getByRole("heading", { name: "Preview: 1850–2100, 3 agents" })).toBeVisible();
  await snap(page, testInfo, "pathway-upload-preview");
  await page.getByRole("button", { name: "Save pathway" }).click();

  await expect(page.getByRole("heading", { level: 1, name: names.uploadedPathway })).toBeVisible();
  await expect(page.getByText("2025 desk study").first()).toBeVisible();
  await snap(page, testInfo, "pathway-detail", "pathway-detail.png");

  // Nothing of the bad file was kept.
  await openFromNav(page, "Pathways");
  await expect(page.getByRole("link", { name: names.uploadedPathway })).toBeVisible();
  await expect(page.getByRole("link", { name: names.rejectedPathway })).toHaveCount(0);
});

test("analyst drafts a wider aerosol–cloud range from the approved version and submits it", async ({ page }, testInfo) => {
  await signIn(page, "analyst");
  await openFromNav(page, "Model versions");
  const approved = page.getByRole("table", { name: "Model versions" }).getByRole("row").filter({ hasText: seededVersionName }).filter({ hasText: "approved" });
  await approved.getByRole("link", { name: seededVersionName }).click();
  await expect(page.getByRole("heading", { level: 1, name: `${seededVersionName} v1` })).toBeVisible();
  await page.getByRole("link", { name: "New draft from this" }).click();

  await expect(page.getByRole("heading", { level: 1, name: /New draft from/ })).toBeVisible();
  await page.getByRole("textbox", { name: "Name", exact: true }).fill(names.widerDraft);
  const notes = page.getByLabel("Notes: sources and justification");
  await notes.press("ControlOrMeta+End");
  await notes.press("Enter");
  await notes.pressSequentially("- Aerosol–cloud scale widened to 0.1–2.0 (5–95 %) for a stress view of aerosol uncertainty.");

  const aci = page.getByRole("group", { name: "Aerosol–cloud scale" });
  await aci.getByLabel("Low end").fill("0.1");
  await aci.getByLabel("High end").fill("2.0");
  // The live preview follows the typed range: its 5 % and 95 % are the range ends.
  const preview = aci.getByRole("table", { name: /percentiles of the distribution/ });
  await expect(preview.getByRole("cell").first()).toHaveText("0.100");
  await expect(preview.getByRole("cell").last()).toHaveText("2.000");
  await aci.evaluate((el) => el.scrollIntoView({ block: "center" })); // clear of the sticky save bar
  await snap(page, testInfo, "model-version-editor", "model-version-editor.png");

  await page.getByRole("button", { name: "Save draft" }).click();
  await expect(page.getByRole("heading", { level: 1, name: new RegExp(`^${names.widerDraft} v\\d+$`) })).toBeVisible();
  await expect(page.getByText("Model version draft")).toBeVisible();

  // The diff against the parent names exactly the widened range.
  const diff = page.getByRole("table").filter({ has: page.getByRole("columnheader", { name: "Before" }) });
  await expect(diff.getByRole("row").filter({ hasText: "aerosol-cloud" }).first()).toBeVisible();
  await expect(diff).toContainText("0.298");
  await expect(diff).toContainText("1.726");
  // Only what the analyst touched: the copy keeps everything else of its parent (pins included).
  await expect(diff.getByRole("row").filter({ hasText: "pathwayIds" })).toHaveCount(0);

  await page.getByRole("radio", { name: /^Major/ }).check();
  await page.getByLabel("Note to the reviewer (optional)").fill("Stress view: wider aerosol–cloud range, everything else unchanged.");
  await page.getByRole("button", { name: "Submit for review" }).click();
  await expect(page.getByText("Model version in review")).toBeVisible();
  await snap(page, testInfo, "model-version-submitted");
});
