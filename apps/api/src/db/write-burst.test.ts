import { spawn, type ChildProcessWithoutNullStreams } from "node:child_process";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../test-support/test-context.js";
import { testPathwayBody } from "../modules/runs/runs.fixtures.js";

// Bursts of writes: node-sqlite3 runs statements on libuv's 4-thread pool and Sequelize opens one
// connection per transaction, so unserialised transactions waiting on the lock used to fill the
// pool and starve the one holding it (7 of 40 saves succeeded, the rest 500 or no answer).

const secondProcessScript = path.join(path.dirname(fileURLToPath(import.meta.url)), "../test-support/second-process-writer.ts");

function startSecondProcess(args: string[]): { child: ChildProcessWithoutNullStreams; line: (match: RegExp) => Promise<string>; exited: Promise<number | null> } {
  const child = spawn(process.execPath, ["--import", "tsx", secondProcessScript, ...args], { stdio: ["pipe", "pipe", "pipe"] });
  let out = "";
  let err = "";
  const waiters: Array<() => void> = [];
  child.stdout.on("data", (chunk: Buffer) => {
    out += chunk.toString();
    for (const w of waiters.splice(0)) w();
  });
  child.stderr.on("data", (chunk: Buffer) => void (err += chunk.toString()));
  const exited = new Promise<number | null>((resolve) => child.on("exit", (code) => resolve(code)));
  const line = (match: RegExp) =>
    new Promise<string>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error(`second process said ${JSON.stringify(out)} / ${err}`)), 30_000);
      const check = () => {
        const found = out.split("\n").find((l) => match.test(l));
        if (found !== undefined) {
          clearTimeout(timer);
          resolve(found);
        } else waiters.push(check);
      };
      check();
    });
  return { child, line, exited };
}

let t: TestContext;
let analyst: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  analyst = await signIn(t.app, "analyst");
});
afterAll(async () => t.close());

describe("a burst of saves", () => {
  it("saves 40 pathways sent at once, every one 201, the last within 20 s", async () => {
    const started = Date.now();
    const responses = await Promise.all(
      Array.from({ length: 40 }, (_, i) => analyst.post("/api/pathways").send(testPathwayBody(`Burst ${i}`)).timeout(60_000)),
    );
    const elapsed = Date.now() - started;
    expect(responses.map((r) => r.status)).toEqual(Array(40).fill(201));
    expect(elapsed).toBeLessThan(20_000);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "pathway.created" } })).toBeGreaterThanOrEqual(40);
  }, 60_000);

  it("shares the file with a second process writing a burst of its own: every write of both lands", async () => {
    const second = startSecondProcess(["burst", t.ctx.config.databaseFile, "40"]);
    const responses = await Promise.all(
      Array.from({ length: 40 }, (_, i) => analyst.post("/api/pathways").send(testPathwayBody(`Shared ${i}`)).timeout(60_000)),
    );
    const report = await second.line(/^done /);
    expect(await second.exited).toBe(0);
    expect(responses.map((r) => r.status)).toEqual(Array(40).fill(201));
    expect(report).toBe("done 40 0");
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "test.second-process" } })).toBe(40);
  }, 60_000);

  it("answers 503 with Retry-After (not 500) while another process holds the write lock past the wait, then saves again", async () => {
    const holder = startSecondProcess(["hold", t.ctx.config.databaseFile, "14000"]);
    await holder.line(/^locked$/);
    const before = await t.ctx.models.Pathway.count();
    const res = await analyst.post("/api/pathways").send(testPathwayBody("While locked")).timeout(60_000);
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe("database_busy");
    expect(Number(res.headers["retry-after"])).toBeGreaterThan(0);
    expect(await holder.exited).toBe(0);
    expect(await t.ctx.models.Pathway.count()).toBe(before);
    const after = await analyst.post("/api/pathways").send(testPathwayBody("After the lock"));
    expect(after.status).toBe(201);
  }, 60_000);
});
