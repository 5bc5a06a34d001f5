import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";

export interface RedisTestServer {
  url: string;
  port: number;
  stop(): Promise<void>;
}

/** Test support: tests of QUEUE=bullmq run against a real Redis, never a mock. */
export const REDIS_MISSING_MESSAGE =
  "redis-server is not installed, and the QUEUE=bullmq tests need a real Redis: install it with `apt-get install -y redis-server` (Debian) — .ci/run does this in CI.";

/**
 * Starts Debian's `redis-server` on a free loopback port with persistence off (a throwaway
 * instance per test file). Throws — so the test FAILS, never skips — when it is not installed.
 */
export async function startRedisTestServer(): Promise<RedisTestServer> {
  const probe = spawnSync("redis-server", ["--version"], { encoding: "utf8" });
  if (probe.error || probe.status !== 0) throw new Error(REDIS_MISSING_MESSAGE);
  const port = await freePort();
  const child = spawn("redis-server", ["--port", String(port), "--bind", "127.0.0.1", "--save", "", "--appendonly", "no"], {
    stdio: ["ignore", "pipe", "pipe"],
  });
  await waitUntilReady(child, port);
  return {
    url: `redis://127.0.0.1:${port}`,
    port,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) { resolve(); return; }
        child.once("exit", () => resolve());
        child.kill("SIGTERM");
      }),
  };
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

function waitUntilReady(child: ChildProcess, port: number): Promise<void> {
  return new Promise((resolve, reject) => {
    let output = "";
    const timer = setTimeout(() => fail(new Error(`redis-server on port ${port} did not become ready in 10 s:\n${output}`)), 10_000);
    const fail = (error: Error) => {
      clearTimeout(timer);
      child.kill("SIGKILL");
      reject(error);
    };
    const onExit = (code: number | null) => fail(new Error(`redis-server on port ${port} exited with code ${code}:\n${output}`));
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      if (output.includes("Ready to accept connections")) {
        clearTimeout(timer);
        child.off("exit", onExit);
        child.stdout?.off("data", onData);
        child.stderr?.off("data", onData);
        resolve();
      }
    };
    child.stdout?.on("data", onData);
    child.stderr?.on("data", onData);
    child.once("exit", onExit);
  });
}
