import type { Page } from "@playwright/test";

/** Follows a link of the main navigation, as a user moves between pages. */
export async function openFromNav(page: Page, label: "Desk" | "Pathways" | "Model versions" | "Runs" | "Peril lens" | "Exports" | "Admin"): Promise<void> {
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: label, exact: true }).click();
}
