/**
 * API benchmark (issue 3, "Performance"): against a RUNNING server, create a 100,000-member
 * run over three pathways and report
 *   - time from the POST /api/runs request to the result being stored (status "succeeded",
 *     which the worker sets in the same transaction as the result rows),
 *   - the engine CLI's time for the very same spec (GET /api/runs/:id manifest.spec) in the
 *     same session, and the ratio (target <= 1.5),
 *   - p50/p95/max latency of GET /api/runs polled while the run executes (target p95 < 100 ms:
 *     the engine runs in worker threads and never blocks the event loop).
 *
 *   node --import tsx apps/api/scripts/bench-api.ts [--base http://localhost:4102] [--members 100000]
 *       [--email analyst@harbourline.example --password plume-demo-analyst]
 *
 * Uses the demo seed's approved model version and the Harbourline Low/Middle/High pathways.
 * Prints a human summary and one JSON line.
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";

const args = process.argv.slice(2);
const arg = (name: string, fallback: string) => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 && args[i + 1] ? args[i + 1]! : fallback;
};
const base = arg("base", "http://localhost:4102").replace(/\/$/, "");
const members = Number(arg("members", "100000"));
const email = arg("email", "analyst@harbourline.example");
const password = arg("password", "plume-demo-analyst");
const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");

let cookie = "";
// eslint-disable-next-line @typescript-eslint/no-unnecessary-type-parameters -- the caller names the JSON body's type (a cast at this script's HTTP boundary)
async function api<T>(method: string, url: string, body?: unknown): Promise<{ status: number; body: T; ms: number }> {
  const t0 = performance.now();
  const res = await fetch(`${base}${url}`, {
    method,
    headers: { "content-type": "application/json", origin: base, ...(cookie ? { cookie } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  const ms = performance.now() - t0;
  const setCookies = res.headers.getSetCookie?.() ?? [];
  if (setCookies.length > 0) cookie = setCookies.map((c) => c.split(";")[0]).join("; ");
  return { status: res.status, body: (text ? JSON.parse(text) : null) as T, ms };
}

function percentile(sorted: number[], p: number): number {
  // Linear interpolation between order statistics (R type 7).
  if (sorted.length === 0) return NaN;
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  return sorted[lo]! + (h - lo) * ((sorted[Math.min(lo + 1, sorted.length - 1)] ?? sorted[lo]!) - sorted[lo]!);
}

async function main() {
  const signIn = await api("POST", "/api/auth/sign-in/email", { email, password });
  if (signIn.status !== 200) throw new Error(`sign-in failed (${signIn.status}); is the demo seed loaded?`);
  const versions = await api<Array<{ id: string; name: string; versionNumber: number }>>("GET", "/api/model-versions?status=approved");
  const version = versions.body[0];
  if (!version) throw new Error("no approved model version on the server");
  const pathways = await api<Array<{ id: string; name: string }>>("GET", "/api/pathways");
  const wanted = ["Harbourline Low", "Harbourline Middle", "Harbourline High"];
  const chosen = wanted.map((n) => pathways.body.find((p) => p.name === n)).filter((p): p is { id: string; name: string } => !!p);
  const three = chosen.length === 3 ? chosen : pathways.body.slice(0, 3);

  const listLatencies: number[] = [];
  const t0 = performance.now();
  const created = await api<{ id: string; status: string }>("POST", "/api/runs", {
    name: `bench ${members} members`,
    modelVersionId: version.id,
    pathwayIds: three.map((p) => p.id),
    members,
    seed: `bench-${Date.now()}`,
    sampling: "latin-hypercube",
  });
  if (created.status !== 201) throw new Error(`run not created: ${created.status} ${JSON.stringify(created.body)}`);
  const runId = created.body.id;

  let done = false;
  const poller = (async () => {
    while (!done) {
      listLatencies.push((await api("GET", "/api/runs")).ms);
      await new Promise((r) => setTimeout(r, 50));
    }
  })();
  let status = "queued";
  while (status === "queued" || status === "running") {
    await new Promise((r) => setTimeout(r, 50));
    status = (await api<{ status: string }>("GET", `/api/runs/${runId}`)).body.status;
  }
  const apiSeconds = (performance.now() - t0) / 1000;
  done = true;
  await poller;
  if (status !== "succeeded") throw new Error(`run ended ${status}`);

  const run = await api<{ manifest: { spec: unknown; resultHash: string } }>("GET", `/api/runs/${runId}`);
  const dir = mkdtempSync(path.join(os.tmpdir(), "plumeline-bench-"));
  const specFile = path.join(dir, "spec.json");
  writeFileSync(specFile, JSON.stringify(run.body.manifest.spec));
  const c0 = performance.now();
  const cli = spawnSync(process.execPath, [path.join(repoRoot, "packages/engine/bin/plumeline-engine.mjs"), "run", specFile], {
    encoding: "utf8",
    maxBuffer: 1 << 28,
  });
  const cliSeconds = (performance.now() - c0) / 1000;
  if (cli.status !== 0) throw new Error(`engine CLI failed: ${cli.stderr}`);
  const cliHash = (JSON.parse(cli.stdout) as { resultHash: string }).resultHash;

  const sorted = [...listLatencies].sort((a, b) => a - b);
  const report = {
    members,
    pathways: three.map((p) => p.name),
    apiSeconds: Number(apiSeconds.toFixed(2)),
    cliSeconds: Number(cliSeconds.toFixed(2)),
    ratio: Number((apiSeconds / cliSeconds).toFixed(2)),
    ratioTarget: 1.5,
    listSamples: sorted.length,
    listP50Ms: Number(percentile(sorted, 0.5).toFixed(1)),
    listP95Ms: Number(percentile(sorted, 0.95).toFixed(1)),
    listMaxMs: Number((sorted[sorted.length - 1] ?? NaN).toFixed(1)),
    listP95TargetMs: 100,
    sameResultHash: cliHash === run.body.manifest.resultHash,
    // The machine may be shared: the 1-minute load average says how busy it was.
    loadAverage: Number(os.loadavg()[0]!.toFixed(2)),
    cores: os.availableParallelism(),
  };
  console.log(
    `API: ${members} members x ${three.length} pathways, request -> result stored ${report.apiSeconds} s; ` +
      `engine CLI same spec ${report.cliSeconds} s; ratio ${report.ratio} (target <= 1.5)\n` +
      `GET /api/runs while running: ${report.listSamples} requests, p50 ${report.listP50Ms} ms, p95 ${report.listP95Ms} ms, max ${report.listMaxMs} ms (target p95 < 100 ms)\n` +
      `result hash API == CLI: ${report.sameResultHash}; load average ${report.loadAverage} on ${report.cores} cores`,
  );
  console.log(JSON.stringify(report));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
