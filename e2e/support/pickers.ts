import { expect, type Locator, type Page } from "@playwright/test";

/**
 * Chooses an item in one of the app's searchable pickers (a combobox over the server's list):
 * types `search` into the box named `label`, then clicks the option whose name is exactly
 * `option` among the matches the server sends back.
 */
export async function pick(scope: Page | Locator, label: string, search: string, option: string = search): Promise<void> {
  const box = scope.getByRole("combobox", { name: label, exact: true });
  await box.fill(search);
  const listbox = scope.getByRole("listbox", { name: label, exact: true });
  await listbox.getByRole("option", { name: option, exact: true }).first().click();
}

/** Chooses several items in a multi-item picker, then checks they are all listed as chosen. */
export async function pickEach(scope: Page | Locator, label: string, options: readonly string[]): Promise<void> {
  for (const option of options) await pick(scope, label, option);
  const chosen = scope.getByRole("list", { name: `Chosen: ${label}`, exact: true });
  for (const option of options) await expect(chosen.getByText(option, { exact: true })).toBeVisible();
}
