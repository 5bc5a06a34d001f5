/**
 * How soon a finished run's page draws its charts once the result has arrived, in Debian's
 * Chromium, against a RUNNING server (e.g. after `bench-api.ts --members 1000000 --pathways 4`
 * stored a big run). The result page marks the moment the result's JSON is parsed and
 * records, on window.__plumelinePerf, the time to the charts being in the DOM (domMs) and to
 * the next paint (paintedMs); this script opens the page --repeats times in fresh pages and
 * prints both (target for the fan chart: within 1.5 s).
 *
 *   node e2e/scripts/fan-chart-timing.mjs --base http://127.0.0.1:4250 --run <run id> [--repeats 3]
 *       [--email analyst@harbourline.example --password plume-demo-analyst] [--width 1440]
 */
import { chromium } from "@playwright/test";

const args = process.argv.slice(2);
const arg = (name, fallback) => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 && args[i + 1] ? args[i + 1] : fallback;
};
const base = arg("base", "http://127.0.0.1:4250").replace(/\/$/, "");
const runId = arg("run", "");
const repeats = Number(arg("repeats", "3"));
const email = arg("email", "analyst@harbourline.example");
const password = arg("password", "plume-demo-analyst");
const width = Number(arg("width", "1440"));
if (!runId) {
  console.error("fan-chart-timing: --run <run id> is needed (a succeeded run on the server)");
  process.exit(2);
}
if (!Number.isInteger(repeats) || repeats < 1) {
  console.error("fan-chart-timing: --repeats must be a whole number ≥ 1");
  process.exit(2);
}

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu"],
});
try {
  const context = await browser.newContext({ baseURL: base, viewport: { width, height: 900 } });
  const signIn = await context.request.post("/api/auth/sign-in/email", {
    data: { email, password },
    headers: { Origin: base },
  });
  if (!signIn.ok()) throw new Error(`sign-in as ${email} answered ${signIn.status()}`);
  const timings = [];
  for (let i = 0; i < repeats; i++) {
    const page = await context.newPage();
    await page.goto(`/runs/${encodeURIComponent(runId)}`);
    const handle = await page.waitForFunction(
      (id) => {
        const perf = globalThis.__plumelinePerf;
        return perf && perf.runId === id ? perf : null;
      },
      runId,
      { timeout: 60_000 },
    );
    const perf = await handle.jsonValue();
    const fanPaths = await page.locator('svg[role="img"][aria-label^="Warming above"] path').count();
    if (fanPaths === 0) throw new Error("the page reported its charts drawn but holds no fan chart paths");
    timings.push(perf);
    console.log(`page ${i + 1}: charts in the DOM ${perf.domMs.toFixed(0)} ms, painted ${perf.paintedMs.toFixed(0)} ms after the result arrived (${fanPaths} fan chart paths)`);
    await page.close();
  }
  const painted = timings.map((t) => t.paintedMs).sort((a, b) => a - b);
  const median = painted[Math.floor((painted.length - 1) / 2)];
  const load = (await import("node:os")).loadavg()[0].toFixed(2);
  console.log(JSON.stringify({ runId, repeats, paintedMsMedian: median, paintedMs: painted, targetMs: 1500, loadAverage: Number(load) }));
} finally {
  await browser.close();
}
