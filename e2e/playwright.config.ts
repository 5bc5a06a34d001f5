import { defineConfig } from "@playwright/test";
import os from "node:os";
import path from "node:path";

/**
 * End-to-end flows against the built app (one port: web + API), in Debian's Chromium.
 * The server starts with a fresh data folder so every run begins from the demo seed.
 */
const port = Number(process.env.E2E_PORT ?? 4173);
const dataDir = process.env.E2E_DATA_DIR ?? path.join(os.tmpdir(), `plumeline-e2e-${process.pid}`);
/** Set E2E_BASE_URL to point the suite at a server you started yourself (no fresh seed then). */
const external = process.env.E2E_BASE_URL;
export const baseURL = external ?? `http://localhost:${port}`;

export default defineConfig({
  testDir: "./specs",
  outputDir: "./artifacts/results",
  // The flows build on each other's data (01 drafts, 02 approves, 03 runs, …): one worker,
  // files in name order, no retries (a retry would meet the first attempt's data).
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 120_000,
  expect: { timeout: 20_000 },
  reporter: [["list"], ["html", { outputFolder: "./artifacts/report", open: "never" }]],
  use: {
    baseURL,
    trace: "retain-on-failure",
    actionTimeout: 20_000,
    navigationTimeout: 30_000,
    screenshot: "only-on-failure",
    viewport: { width: 1440, height: 900 },
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: [
        "--no-sandbox",
        "--disable-gpu",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--no-first-run",
      ],
    },
  },
  webServer: external
    ? undefined
    : {
        command: "pnpm -w start",
        cwd: "..",
        url: `${baseURL}/api/health`,
        timeout: 240_000,
        reuseExistingServer: false,
        stdout: "pipe",
        env: {
          PORT: String(port),
          PLUMELINE_DATA_DIR: dataDir,
          WORKERS: "2",
          SIGN_IN_RATE_LIMIT: "1000",
        },
      },
});
