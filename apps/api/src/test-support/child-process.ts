import { spawn, type ChildProcess, type SpawnOptions } from "node:child_process";
import { createServer } from "node:net";

/** Test support: real processes (API server, engine workers) started as they run in production. */
export interface StartedProcess {
  child: ChildProcess;
  /** Everything it printed so far (stdout and stderr). */
  output(): string;
  /** Resolves once its output contains `text`; rejects if it exits first or `ms` pass. */
  waitFor(text: string | RegExp, ms?: number): Promise<void>;
  /** SIGKILL: no shutdown step runs (a machine that loses power). */
  kill(): Promise<void>;
  /** SIGTERM, then SIGKILL after 10 s. */
  stop(): Promise<void>;
}

export function startProcess(command: string, args: string[], options: SpawnOptions): StartedProcess {
  const child = spawn(command, args, { ...options, stdio: ["ignore", "pipe", "pipe"] });
  let output = "";
  const listeners = new Set<() => void>();
  const onData = (chunk: Buffer) => {
    output += chunk.toString();
    for (const listener of [...listeners]) listener();
  };
  child.stdout?.on("data", onData);
  child.stderr?.on("data", onData);
  child.on("exit", () => {
    for (const listener of [...listeners]) listener();
  });
  const exited = () => child.exitCode !== null || child.signalCode !== null;
  const ended = () => new Promise<void>((resolve) => (exited() ? resolve() : child.once("exit", () => resolve())));
  return {
    child,
    output: () => output,
    waitFor(text, ms = 60_000) {
      return new Promise((resolve, reject) => {
        const matches = () => (typeof text === "string" ? output.includes(text) : text.test(output));
        const timer = setTimeout(() => done(new Error(`no "${text}" within ${ms} ms; output:\n${output}`)), ms);
        const check = () => {
          if (matches()) done();
          else if (exited()) done(new Error(`the process exited (${child.exitCode ?? child.signalCode}) before printing "${text}"; output:\n${output}`));
        };
        const done = (error?: Error) => {
          clearTimeout(timer);
          listeners.delete(check);
          if (error) reject(error);
          else resolve();
        };
        listeners.add(check);
        check();
      });
    },
    async kill() {
      if (!exited()) child.kill("SIGKILL");
      await ended();
    },
    async stop() {
      if (exited()) return;
      const force = setTimeout(() => child.kill("SIGKILL"), 10_000);
      child.kill("SIGTERM");
      await ended();
      clearTimeout(force);
    },
  };
}

export function freePort(): Promise<number> {
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
