import { expect, test } from "@playwright/test";
import { baseURL } from "../playwright.config";
import { openFromNav } from "../support/navigation";
import { pick } from "../support/pickers";
import { snap } from "../support/screenshots";
import { apiAs, getJson, signIn } from "../support/sign-in";

/**
 * Analyst: composes a pathway without writing JSON — starts from a seeded pathway, halves
 * its aerosol–cloud forcing from 2030, extends it to 2150 by a linear trend fitted over the
 * last 30 years, saves it, and finds it in the list with its chart and its recipe.
 */
const composedName = "Middle, half aerosol–cloud from 2030, to 2150";

interface StoredPathway {
  id: string;
  name: string;
  startYear: number;
  endYear: number;
  description: string;
  agents: Record<string, { erf?: number[] }>;
}

for (const width of [1280, 1440]) {
  test(`analyst composes a pathway by scale and extend at ${width} px, saves it and finds it`, async ({ page }, testInfo) => {
    await page.setViewportSize({ width, height: 900 });
    const name = `${composedName} (${width})`;
    await signIn(page, "analyst");
    await openFromNav(page, "Pathways");
    await page.getByRole("link", { name: "Compose a pathway" }).click();
    await expect(page.getByRole("heading", { level: 1, name: "Compose a pathway" })).toBeVisible();
    await pick(page, "Start from", "Harbourline Middle");

    const addStep = (label: string) => page.getByRole("group", { name: "Add a step" }).getByRole("button", { name: label }).click();
    await addStep("Scale an agent");
    const scale = page.getByRole("region", { name: "Step 1: Scale an agent" });
    await scale.getByLabel("Agent").selectOption({ label: "Aerosol–cloud (W m-2)" });
    await scale.getByLabel("Factor").fill("0.5");
    await scale.getByLabel("From year").fill("2030");
    await expect(scale.getByText("Changed: 1 agent; the pathway now covers 1750–2100.")).toBeVisible();
    await expect(scale.getByRole("heading", { name: "Step 1: Aerosol–cloud (W m-2)" })).toBeVisible();

    await addStep("Extend beyond the last year");
    const extend = page.getByRole("region", { name: "Step 2: Extend beyond the last year" });
    await extend.getByLabel("Extend to year").fill("2150");
    await extend.getByLabel("How").selectOption("linear");
    await extend.getByLabel("Fit the trend over the last N years").fill("30");
    await expect(extend.getByText(/the pathway now covers 1750–2150\./)).toBeVisible();
    await expect(extend.getByRole("heading", { name: "Step 2: net forcing" })).toBeVisible();
    await snap(page, testInfo, `composer-${width}`);

    await page.getByLabel("Name").fill(name);
    await page.getByRole("button", { name: "Save as new pathway" }).click();
    await expect(page.getByRole("heading", { level: 1, name })).toBeVisible();
    await expect(
      page.getByText(
        /Composed in Plumeline from "Harbourline Middle" \(id [^)]+\): 1\. Aerosol–cloud scaled by 0\.5 in 2030–2100\. 2\. extended to 2150/,
      ),
    ).toBeVisible();
    await expect(page.getByText("1750–2150", { exact: true })).toBeVisible();
    await expect(page.getByRole("figure", { name: `Forcing by agent — ${name}` })).toBeVisible();
    await snap(page, testInfo, `composed-pathway-${width}`);

    await openFromNav(page, "Pathways");
    await expect(page.getByRole("link", { name })).toBeVisible();

    // The stored numbers follow the closed forms: half the base's aerosol–cloud forcing from 2030 on, the base's before.
    const api = await apiAs("analyst", baseURL);
    const list = await getJson<StoredPathway[] | { items: StoredPathway[] }>(api, "/api/pathways?limit=100");
    const summaries = Array.isArray(list) ? list : list.items;
    const composed = await getJson<StoredPathway>(api, `/api/pathways/${summaries.find((p) => p.name === name)!.id}`);
    const base = await getJson<StoredPathway>(api, `/api/pathways/${summaries.find((p) => p.name === "Harbourline Middle")!.id}`);
    const at = (p: StoredPathway, year: number) => p.agents["aerosol-cloud"]!.erf![year - p.startYear]!;
    expect(composed.endYear).toBe(2150);
    expect(at(composed, 2029)).toBe(at(base, 2029));
    expect(at(composed, 2030)).toBe(at(base, 2030) * 0.5);
    expect(at(composed, 2100)).toBe(at(base, 2100) * 0.5);
    await api.dispose();
  });
}
