import fs from "node:fs";
import path from "node:path";
import type { Page, TestInfo } from "@playwright/test";

const e2eRoot = path.resolve(import.meta.dirname, "..");
const artifacts = path.join(e2eRoot, "artifacts", "screenshots");
const docs = path.resolve(e2eRoot, "..", "docs", "screenshots");

/**
 * Saves a full-page screenshot of a key screen under e2e/artifacts/screenshots/<flow>/ and
 * attaches it to the report. With UPDATE_DOCS_SCREENSHOTS=1 the ones picked for the docs
 * (`docsName`) are also written to docs/screenshots/ as they appear in the window (1440×900
 * at the current scroll), so the sticky sidebar looks as it does to a user; ordinary test
 * runs never touch committed files.
 */
export async function snap(page: Page, testInfo: TestInfo, name: string, docsName?: string): Promise<void> {
  const flow = path.basename(testInfo.file, ".spec.ts");
  const file = path.join(artifacts, flow, `${name}.png`);
  fs.mkdirSync(path.dirname(file), { recursive: true });
  // Let charts finish their transitions and web fonts settle before the picture.
  await page.evaluate(() => document.fonts.ready);
  await page.waitForTimeout(300);
  const body = await page.screenshot({ path: file, fullPage: true, animations: "disabled" });
  await testInfo.attach(name, { body, contentType: "image/png" });
  if (docsName && process.env.UPDATE_DOCS_SCREENSHOTS === "1") {
    fs.mkdirSync(docs, { recursive: true });
    await page.screenshot({ path: path.join(docs, docsName), animations: "disabled" });
  }
}
