import { defineConfig } from "@playwright/test";
import os from "node:os";
import path from "node:path";

/**
 * End-to-end flows against the built app (one port: web + API), in Debian's Chromium.
 * The server starts with a fresh data folder so every run begins from the demo seed.
 */
const port = Number(process.env.E2E_PORT ?? 4173);
const dataDir = process.env.E2E_DATA_DIR ?? path.join(os.tmpdir(), `plumeline-e2e-${process.pid}`);
export const baseURL = `http://localhost:${port}`;

export default defineConfig({
  testDir: "./specs",
  outputDir: "./artifacts/results",
  fullyParallel: false,
  workers: 1,
  timeout: 90_000,
  expect: { timeout: 15_000 },
  retries: process.env.CI ? 1 : 0,
  reporter: [["list"], ["html", { outputFolder: "./artifacts/report", open: "never" }]],
  use: {
    baseURL,
    trace: "retain-on-failure",
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
  webServer: {
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
