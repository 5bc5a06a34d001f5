import { spawnSync } from "node:child_process";
import { existsSync, readdirSync, readlinkSync } from "node:fs";
import { chmod, mkdtemp, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { demoUsers } from "@plumeline/seeds";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { repoRoot } from "../config.js";
import { startRedisTestServer, type RedisTestServer } from "../queue/redis-test-server.js";
import { freePort, startProcess, type StartedProcess } from "../test-support/child-process.js";

/**
 * Scale-out as it runs in production, all real processes: Debian's redis-server, the API
 * (`src/server.ts`) with QUEUE=bullmq and WORKERS=0 so it computes nothing, and two stateless
 * engine workers (`src/worker.ts`, what `pnpm worker` starts) that CANNOT reach the data
 * folder: they run as the unprivileged user `nobody` and the folder is readable by root only.
 * One worker is killed (SIGKILL) mid-run; BullMQ's stalled-job check hands its job to the
 * other, and every run ends with the result hash the engine CLI gives for the same spec.
 */
const apiDir = path.join(repoRoot, "apps/api");
const UNPRIVILEGED = 65534; // nobody
let redis: RedisTestServer;
let dataDir: string;
let workerHome: string;
let api: StartedProcess;
const workers: StartedProcess[] = [];
let base: string;
let cookie = "";

// eslint-disable-next-line @typescript-eslint/no-unnecessary-type-parameters -- the caller names the JSON body's type (a cast at this HTTP boundary)
async function call<T>(method: string, url: string, body?: unknown): Promise<{ status: number; body: T }> {
  const res = await fetch(`${base}${url}`, {
    method,
    headers: { "content-type": "application/json", origin: base, ...(cookie ? { cookie } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const setCookies = res.headers.getSetCookie();
  if (setCookies.length > 0) cookie = setCookies.map((c) => c.split(";")[0]).join("; ");
  const text = await res.text();
  return { status: res.status, body: (text ? JSON.parse(text) : null) as T };
}
const items = <T>(body: T[] | { items: T[] }): T[] => (Array.isArray(body) ? body : body.items);

/**
 * As root, the workers drop to `nobody` — when `nobody` can read this checkout. A clone under a
 * private folder (say /root, mode 700) cannot be run by `nobody`; the workers then run as the
 * current user, and what the test proves is that they hold no file of the data folder open
 * (read from /proc) and are never told where it is.
 */
function unprivilegedCanRunWorkers(): boolean {
  if (process.getuid?.() !== 0) return false;
  const probe = spawnSync(process.execPath, ["-e", `require("fs").accessSync(${JSON.stringify(path.join(apiDir, "src/worker.ts"))})`], {
    uid: UNPRIVILEGED,
    gid: UNPRIVILEGED,
  });
  return probe.status === 0;
}
const asNobody = unprivilegedCanRunWorkers();
const asUnprivileged = (): { uid?: number; gid?: number } => (asNobody ? { uid: UNPRIVILEGED, gid: UNPRIVILEGED } : {});

/** Files under `folder` that a process holds open, from /proc/<pid>/fd (Linux). */
function openFilesUnder(pid: number | undefined, folder: string): string[] {
  if (pid === undefined) return [];
  const dir = `/proc/${pid}/fd`;
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .map((fd) => {
      try {
        return readlinkSync(path.join(dir, fd));
      } catch {
        return "";
      }
    })
    .filter((target) => target.startsWith(folder));
}

function startWorker(name: string): StartedProcess {
  return startProcess(process.execPath, ["--import", "tsx", "src/worker.ts"], {
    cwd: apiDir,
    ...asUnprivileged(),
    // Only what a worker needs: Redis, its threads, a lock short enough for a quick test.
    env: { PATH: process.env.PATH ?? "/usr/bin:/bin", HOME: workerHome, REDIS_URL: redis.url, WORKERS: "1", WORKER_LOCK_MS: "3000", WORKER_NAME: name },
  });
}

beforeAll(async () => {
  redis = await startRedisTestServer();
  dataDir = await mkdtemp(path.join(os.tmpdir(), "plumeline-scale-out-"));
  await chmod(dataDir, 0o700); // root only
  workerHome = await mkdtemp(path.join(os.tmpdir(), "plumeline-worker-home-"));
  await chmod(workerHome, 0o777);
  const port = await freePort();
  base = `http://127.0.0.1:${port}`;
  api = startProcess(process.execPath, ["--import", "tsx", "src/server.ts"], {
    cwd: apiDir,
    env: {
      PATH: process.env.PATH ?? "/usr/bin:/bin",
      NODE_ENV: "test",
      // Tests log nothing by default; this test reads the start-up line.
      LOG_LEVEL: "info",
      HOST: "127.0.0.1",
      PORT: String(port),
      PUBLIC_ORIGIN: base,
      PLUMELINE_DATA_DIR: dataDir,
      WEB_DIST: path.join(dataDir, "no-web-build"),
      SMTP_PORT: "0",
      QUEUE: "bullmq",
      REDIS_URL: redis.url,
      WORKERS: "0",
    },
  });
  await api.waitFor("Plumeline is listening", 120_000);
  workers.push(startWorker("worker-a"), startWorker("worker-b"));
  await Promise.all(workers.map((w) => w.waitFor("ready", 60_000)));
}, 240_000);

afterAll(async () => {
  await Promise.all(workers.map((w) => w.stop()));
  await api?.stop();
  await redis?.stop();
  if (dataDir) await rm(dataDir, { recursive: true, force: true });
  if (workerHome) await rm(workerHome, { recursive: true, force: true });
});

describe("scale-out: API with WORKERS=0 and two stateless worker processes", () => {
  it("the workers cannot read the data folder", () => {
    if (asNobody) {
      const probe = spawnSync(process.execPath, ["-e", `require("fs").readdirSync(${JSON.stringify(dataDir)})`], { ...asUnprivileged(), encoding: "utf8" });
      expect(probe.status).not.toBe(0);
      expect(probe.stderr).toContain("EACCES");
    }
    // In either mode: no worker holds anything of the data folder open (the API does: its database).
    for (const worker of workers) expect(openFilesUnder(worker.child.pid, dataDir)).toEqual([]);
    expect(openFilesUnder(api.child.pid, dataDir).length).toBeGreaterThan(0);
  });

  it("runs every job on the workers; a worker killed mid-run loses nothing and the hashes equal the CLI's", async () => {
    const analyst = demoUsers.find((u) => u.key === "analyst")!;
    expect((await call("POST", "/api/auth/sign-in/email", { email: analyst.email, password: analyst.password })).status).toBe(200);
    const version = items((await call<Array<{ id: string }>>("GET", "/api/model-versions?status=approved")).body)[0]!;
    const pathways = items((await call<Array<{ id: string }>>("GET", "/api/pathways")).body).slice(0, 2);
    const ids: string[] = [];
    for (let i = 0; i < 3; i++) {
      const created = await call<{ id: string }>("POST", "/api/runs", {
        name: `scale-out ${i}`,
        modelVersionId: version.id,
        pathwayIds: pathways.map((p) => p.id),
        members: 30_000,
        seed: `scale-out-${i}`,
        sampling: "latin-hypercube",
      });
      expect(created.status).toBe(201);
      ids.push(created.body.id);
    }
    type RunView = { id: string; status: string; progress: number; error: string | null; manifest: { spec: unknown; resultHash: string | null } };
    const runs = async () => Promise.all(ids.map(async (id) => (await call<RunView>("GET", `/api/runs/${id}`)).body));
    // Both workers busy (two runs running and past the start): kill one of them.
    const deadline = Date.now() + 120_000;
    while ((await runs()).filter((r) => r.status === "running" && r.progress > 0.05).length < 2) {
      if (Date.now() > deadline) throw new Error("two runs never ran at once");
      await new Promise((r) => setTimeout(r, 100));
    }
    await workers[0]!.kill();
    const finished = Date.now() + 240_000;
    let last = await runs();
    while (last.some((r) => r.status === "queued" || r.status === "running")) {
      if (Date.now() > finished) throw new Error(`runs did not finish: ${JSON.stringify(last.map((r) => r.status))}`);
      await new Promise((r) => setTimeout(r, 250));
      last = await runs();
    }
    expect(last.map((r) => [r.status, r.error])).toEqual(ids.map(() => ["succeeded", null]));
    // The killed worker's run went back to the queue and was finished by the other one; each
    // run was recorded once (one success row each).
    const admin = demoUsers.find((u) => u.key === "admin")!;
    const analystCookie = cookie;
    cookie = "";
    expect((await call("POST", "/api/auth/sign-in/email", { email: admin.email, password: admin.password })).status).toBe(200);
    type AuditRow = { entityId: string | null; summary: string };
    const audit = async (action: string) => (await call<{ items: AuditRow[] }>("GET", `/api/audit?action=${action}&entityType=run&limit=200`)).body.items;
    const requeued = (await audit("run.requeued")).filter((e) => ids.includes(e.entityId ?? ""));
    expect(requeued.length).toBeGreaterThanOrEqual(1);
    expect(requeued[0]!.summary).toContain("stopped answering");
    const succeeded = (await audit("run.succeeded")).filter((e) => ids.includes(e.entityId ?? ""));
    expect(succeeded.map((e) => e.entityId).sort()).toEqual([...ids].sort());
    cookie = analystCookie;
    // The engine CLI on each stored spec gives the stored hash.
    const dir = await mkdtemp(path.join(os.tmpdir(), "plumeline-scale-out-cli-"));
    try {
      for (const run of last) {
        const specFile = path.join(dir, `${run.id}.json`);
        await writeFile(specFile, JSON.stringify(run.manifest.spec));
        const cli = spawnSync(process.execPath, [path.join(repoRoot, "packages/engine/bin/plumeline-engine.mjs"), "run", specFile], { encoding: "utf8", maxBuffer: 1 << 28 });
        expect(cli.status, cli.stderr).toBe(0);
        expect(run.manifest.resultHash).toBe((JSON.parse(cli.stdout) as { resultHash: string }).resultHash);
      }
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
    // The API computes nothing itself: with no worker left, a new run waits in the queue ...
    await workers[1]!.stop();
    const waiting = await call<{ id: string }>("POST", "/api/runs", {
      modelVersionId: version.id, pathwayIds: [pathways[0]!.id], members: 500, seed: "no-worker", sampling: "latin-hypercube",
    });
    await new Promise((r) => setTimeout(r, 3000));
    expect((await call<RunView>("GET", `/api/runs/${waiting.body.id}`)).body).toMatchObject({ status: "queued", progress: 0 });
    // ... until a worker starts.
    workers.push(startWorker("worker-c"));
    const until = Date.now() + 90_000;
    while ((await call<RunView>("GET", `/api/runs/${waiting.body.id}`)).body.status !== "succeeded") {
      if (Date.now() > until) throw new Error("the late worker did not run the waiting job");
      await new Promise((r) => setTimeout(r, 250));
    }
  }, 600_000);
});
