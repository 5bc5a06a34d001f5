/**
 * API benchmark, against a RUNNING server (loopback or your own port; nothing else is touched).
 *
 * One run (default): create a run of --members over --pathways pathways and report
 *   - time from the POST /api/runs request to the result being stored (status "succeeded",
 *     set in the same transaction as the result), and the engine CLI's time for the very same
 *     spec in the same session, with their ratio (target <= 1.5; --skip-cli leaves it out);
 *   - how soon progress moves: the first poll (every 50 ms) that shows progress > 0, counted
 *     from the POST's answer (target: within 1 s);
 *   - p50/p95/max latency of GET /api/runs and GET /api/runs/:id polled while the run executes
 *     (target p95 < 100 ms);
 *   - with --api-pid: the API process's peak resident memory (VmHWM from /proc; target < 1 GiB
 *     for 1,000,000 members x 4 pathways; start the server fresh so the peak is this run's);
 *   - the result's size as stored/sent (gzip) and as JSON.
 * Throughput (--runs N, N > 1): N runs created at once; wall time until all are stored and
 *   runs per minute (issue: 8 runs x 100,000 members with one and with two `pnpm worker`s).
 *
 *   node --import tsx apps/api/scripts/bench-api.ts [--base http://127.0.0.1:4250] [--members 100000]
 *       [--pathways 3] [--runs 1] [--api-pid <pid>] [--skip-cli] [--trace polls.jsonl]
 *       [--email analyst@harbourline.example --password plume-demo-analyst]
 *
 * Uses the demo seed's approved model version and its first --pathways pathways. Prints a human
 * summary and one JSON line.
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";

const args = process.argv.slice(2);
const arg = (name: string, fallback: string) => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 && args[i + 1] ? args[i + 1]! : fallback;
};
const base = arg("base", "http://127.0.0.1:4250").replace(/\/$/, "");
const members = Number(arg("members", "100000"));
const pathwayCount = Number(arg("pathways", "3"));
const runCount = Number(arg("runs", "1"));
const apiPid = arg("api-pid", "");
const skipCli = args.includes("--skip-cli");
const traceFile = arg("trace", "");
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
/** Lists answer `{ items, total }`; a server from before paging answered a bare array. */
const items = <T>(body: T[] | { items: T[] }): T[] => (Array.isArray(body) ? body : body.items);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

function percentile(sorted: number[], p: number): number {
  // Linear interpolation between order statistics (R type 7).
  if (sorted.length === 0) return NaN;
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  return sorted[lo]! + (h - lo) * ((sorted[Math.min(lo + 1, sorted.length - 1)] ?? sorted[lo]!) - sorted[lo]!);
}
const round = (n: number, digits = 1) => Number(n.toFixed(digits));
const latencySummary = (samples: number[]) => {
  const sorted = [...samples].sort((a, b) => a - b);
  return { n: sorted.length, p50: round(percentile(sorted, 0.5)), p95: round(percentile(sorted, 0.95)), max: round(sorted[sorted.length - 1] ?? NaN) };
};

/** Peak and current resident memory of a process, from Linux's /proc (MiB). */
function memoryOf(pid: string): { peakMiB: number; nowMiB: number } | null {
  const file = `/proc/${pid}/status`;
  if (!pid || !existsSync(file)) return null;
  const status = readFileSync(file, "utf8");
  const kib = (key: string) => Number(new RegExp(`${key}:\\s+(\\d+) kB`).exec(status)?.[1] ?? NaN);
  return { peakMiB: round(kib("VmHWM") / 1024), nowMiB: round(kib("VmRSS") / 1024) };
}

type RunView = { id: string; status: string; progress: number; error: string | null; manifest: { spec: unknown; resultHash: string | null } };

async function createRun(version: { id: string }, pathways: Array<{ id: string }>, seed: string) {
  const created = await api<{ id: string }>("POST", "/api/runs", {
    name: `bench ${members} members x ${pathways.length}`,
    modelVersionId: version.id,
    pathwayIds: pathways.map((p) => p.id),
    members,
    seed,
    sampling: "latin-hypercube",
  });
  if (created.status !== 201) throw new Error(`run not created: ${created.status} ${JSON.stringify(created.body)}`);
  return created.body.id;
}

async function main() {
  const signIn = await api("POST", "/api/auth/sign-in/email", { email, password });
  if (signIn.status !== 200) throw new Error(`sign-in failed (${signIn.status}); is the demo seed loaded?`);
  const version = items((await api<{ items: Array<{ id: string }> }>("GET", "/api/model-versions?status=approved")).body)[0];
  if (!version) throw new Error("no approved model version on the server");
  const pathways = items((await api<{ items: Array<{ id: string; name: string }> }>("GET", "/api/pathways?limit=200")).body).slice(0, pathwayCount);
  if (pathways.length < pathwayCount) throw new Error(`the server has only ${pathways.length} pathways`);
  const common = { members, pathways: pathways.map((p) => p.name), loadAverage: round(os.loadavg()[0]!, 2), cores: os.availableParallelism() };

  if (runCount > 1) {
    const t0 = performance.now();
    const ids = await Promise.all(Array.from({ length: runCount }, (_, i) => createRun(version, pathways, `throughput-${Date.now()}-${i}`)));
    for (;;) {
      const runs = await Promise.all(ids.map(async (id) => (await api<RunView>("GET", `/api/runs/${id}`)).body));
      const failed = runs.find((r) => r.status === "failed" || r.status === "cancelled");
      if (failed) throw new Error(`run ${failed.id} ended ${failed.status}: ${failed.error}`);
      if (runs.every((r) => r.status === "succeeded")) break;
      await sleep(200);
    }
    const seconds = (performance.now() - t0) / 1000;
    const report = { ...common, runs: runCount, wallSeconds: round(seconds, 2), runsPerMinute: round((runCount * 60) / seconds, 2), loadAverageAfter: round(os.loadavg()[0]!, 2) };
    console.log(`${runCount} runs of ${members} members x ${pathways.length} pathways: all stored after ${report.wallSeconds} s (${report.runsPerMinute} runs/min); load average ${report.loadAverage} -> ${report.loadAverageAfter}`);
    console.log(JSON.stringify(report));
    return;
  }

  const listLatencies: number[] = [];
  const getLatencies: number[] = [];
  const t0 = performance.now();
  const runId = await createRun(version, pathways, `bench-${Date.now()}`);
  const created = performance.now();
  let firstProgressMs: number | null = null;
  let status = "queued";
  let done = false;
  const poller = (async () => {
    while (!done) {
      listLatencies.push((await api("GET", "/api/runs")).ms);
      await sleep(50);
    }
  })();
  let peak = memoryOf(apiPid);
  // --trace: one line per poll (wall clock, status, progress, the API's memory), to line the
  // memory curve up with the run's phases.
  const trace: object[] = [];
  while (status === "queued" || status === "running") {
    await sleep(50);
    const got = await api<RunView>("GET", `/api/runs/${runId}`);
    getLatencies.push(got.ms);
    status = got.body.status;
    if (firstProgressMs === null && (got.body.progress > 0 || status === "succeeded")) firstProgressMs = performance.now() - created;
    const mem = memoryOf(apiPid);
    if (mem && (!peak || mem.peakMiB > peak.peakMiB)) peak = mem;
    trace.push({ at: Date.now(), sinceCreatedMs: Math.round(performance.now() - created), status, progress: got.body.progress, ...(mem ?? {}) });
  }
  const apiSeconds = (performance.now() - t0) / 1000;
  done = true;
  await poller;
  if (traceFile) writeFileSync(traceFile, trace.map((line) => JSON.stringify(line)).join("\n") + "\n");
  if (status !== "succeeded") throw new Error(`run ended ${status}`);

  // The result as the browser gets it: the stored gzip bytes (Content-Length); fetch inflates
  // the body, so its length is the JSON's.
  const raw = await fetch(`${base}/api/runs/${runId}/result`, { headers: { cookie, "accept-encoding": "gzip" } });
  const gzipBytes = Number(raw.headers.get("content-length") ?? NaN);
  const jsonBytes = Buffer.from(await raw.arrayBuffer()).length;

  const run = await api<RunView>("GET", `/api/runs/${runId}`);
  let cliSeconds: number | null = null;
  let sameResultHash: boolean | null = null;
  if (!skipCli) {
    const dir = mkdtempSync(path.join(os.tmpdir(), "plumeline-bench-"));
    const specFile = path.join(dir, "spec.json");
    writeFileSync(specFile, JSON.stringify(run.body.manifest.spec));
    const c0 = performance.now();
    const cli = spawnSync(process.execPath, [path.join(repoRoot, "packages/engine/bin/plumeline-engine.mjs"), "run", specFile], { encoding: "utf8", maxBuffer: 1 << 28 });
    cliSeconds = (performance.now() - c0) / 1000;
    if (cli.status !== 0) throw new Error(`engine CLI failed: ${cli.stderr}`);
    sameResultHash = (JSON.parse(cli.stdout) as { resultHash: string }).resultHash === run.body.manifest.resultHash;
  }

  const report = {
    ...common,
    runId,
    apiSeconds: round(apiSeconds, 2),
    cliSeconds: cliSeconds === null ? null : round(cliSeconds, 2),
    ratio: cliSeconds === null ? null : round(apiSeconds / cliSeconds, 2),
    ratioTarget: 1.5,
    firstProgressMs: firstProgressMs === null ? null : Math.round(firstProgressMs),
    firstProgressTargetMs: 1000,
    listRuns: latencySummary(listLatencies),
    getRun: latencySummary(getLatencies),
    getP95TargetMs: 100,
    apiMemory: peak,
    apiPeakTargetMiB: 1024,
    resultGzipBytes: gzipBytes,
    resultJsonBytes: jsonBytes,
    sameResultHash,
    loadAverageAfter: round(os.loadavg()[0]!, 2),
  };
  console.log(
    `API: ${members} members x ${pathways.length} pathways, request -> result stored ${report.apiSeconds} s` +
      (cliSeconds === null ? "" : `; engine CLI same spec ${report.cliSeconds} s; ratio ${report.ratio} (target <= 1.5)`) +
      `\nfirst progress ${report.firstProgressMs} ms after the run was created (target < 1000 ms)` +
      `\nGET /api/runs while running: ${report.listRuns.n} requests, p50 ${report.listRuns.p50} ms, p95 ${report.listRuns.p95} ms, max ${report.listRuns.max} ms` +
      `\nGET /api/runs/:id while running: ${report.getRun.n} requests, p50 ${report.getRun.p50} ms, p95 ${report.getRun.p95} ms, max ${report.getRun.max} ms (target p95 < 100 ms)` +
      (peak ? `\nAPI process memory: peak ${peak.peakMiB} MiB, now ${peak.nowMiB} MiB (target peak < 1024 MiB)` : "") +
      `\nresult: ${gzipBytes} bytes gzip as sent, ${jsonBytes} bytes as JSON` +
      (sameResultHash === null ? "" : `\nresult hash API == CLI: ${sameResultHash}`) +
      `\nload average ${report.loadAverage} -> ${report.loadAverageAfter} on ${report.cores} cores`,
  );
  console.log(JSON.stringify(report));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
