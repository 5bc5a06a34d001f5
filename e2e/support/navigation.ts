import type { Page } from "@playwright/test";

/**
 * Follows a link of the main navigation, as a user moves between pages, and waits until the
 * address is the link's: pages load lazily, and until the router has moved the old page
 * (whose tables may hold the names a test looks for next) stays on screen.
 */
export async function openFromNav(page: Page, label: "Desk" | "Pathways" | "Model versions" | "Runs" | "Peril lens" | "Exports" | "Admin"): Promise<void> {
  const link = page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: label, exact: true });
  const target = await link.getAttribute("href");
  await link.click();
  if (target) await page.waitForURL((url) => url.pathname === target);
}
