import { expect, type APIRequestContext, type Page } from "@playwright/test";
import { getJson } from "./sign-in";

export interface RunSummary {
  id: string;
  name: string;
  status: string;
  progress: number;
  exploratory: boolean;
  modelVersion: { id: string; name: string; status: string };
}
export interface VersionSummary {
  id: string;
  name: string;
  status: string;
  versionNumber: number;
}
export interface PathwaySummary {
  id: string;
  name: string;
}
type Stats = Record<string, number>;
export interface RunResult {
  resultHash: string;
  pathways: Array<{ id: string; name: string; horizons: Array<{ year: number; temperature: Stats }> }>;
  perils?: {
    pathways: Array<{
      pathwayId: string;
      profiles: Array<{
        profileId: string;
        name: string;
        horizons: Array<{ year: number; multiplier: Stats; losses: Array<{ region: string; peril: string; aal: Stats }> }>;
      }>;
    }>;
  };
}

/** Waits (polling the API, as the page does) until a run has finished, and says how it ended. */
export async function waitForRun(api: APIRequestContext, id: string, timeoutMs = 90_000): Promise<RunSummary> {
  let run: RunSummary | undefined;
  await expect
    .poll(async () => (run = await getJson<RunSummary>(api, `/api/runs/${id}`)).status, { timeout: timeoutMs, intervals: [500, 1000] })
    .toMatch(/succeeded|failed|cancelled/);
  expect(run!.status, `run ${id}`).toBe("succeeded");
  return run!;
}

/** The ids of seeded pathways by name. */
export async function pathwayIds(api: APIRequestContext, wanted: readonly string[]): Promise<string[]> {
  const { items: all } = await getJson<{ items: PathwaySummary[] }>(api, "/api/pathways?limit=200");
  return wanted.map((name) => {
    const found = all.find((p) => p.name === name);
    expect(found, `pathway ${name}`).toBeTruthy();
    return found!.id;
  });
}

/** Picks a model version in the run form by its name (searched by name; the option reads "<name> v<number>"). */
export async function chooseVersion(page: Page, name: string): Promise<void> {
  await page.getByRole("combobox", { name: "Model version", exact: true }).fill(name);
  const option = page
    .getByRole("listbox", { name: "Model version" })
    .getByRole("option", { name: new RegExp(`^${escapeRegExp(name)} v\\d+$`) });
  await expect(option).toHaveCount(1);
  await option.click();
}

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

/** The run id from a run page URL. */
export const runIdFromUrl = (url: string) => /\/runs\/([^/?#]+)$/.exec(new URL(url).pathname)![1]!;
