import { Writable } from "node:stream";
import express from "express";
import request from "supertest";
import { describe, expect, it } from "vitest";
import { httpLogger, redactUrl } from "./http-logger.js";
import { createLogger } from "./logger.js";

/** A logger that writes its JSON lines into an array instead of stdout. */
function capture() {
  const lines: Array<Record<string, unknown>> = [];
  const sink = new Writable({
    write(chunk: Buffer, _encoding, done) {
      for (const line of chunk.toString("utf8").split("\n")) if (line.trim()) lines.push(JSON.parse(line) as Record<string, unknown>);
      done();
    },
  });
  return { lines, logger: createLogger("info", sink) };
}

function appWith(logger: ReturnType<typeof createLogger>) {
  const app = express();
  app.use(httpLogger(logger));
  app.get("/ok", (_req, res) => res.json({ ok: true }));
  app.get("/missing", (_req, res) => res.status(404).json({}));
  app.get("/broken", (_req, res) => res.status(500).json({}));
  const api = express.Router();
  api.get("/health", (_req, res) => res.json({ ok: true }));
  app.use("/api", api);
  return app;
}

describe("request log", () => {
  it("writes one line per request with method, path, status and duration", async () => {
    const { lines, logger } = capture();
    await request(appWith(logger)).get("/ok").set("Cookie", "better-auth.session_token=abc.def").set("Authorization", "Bearer s3cret");
    expect(lines).toHaveLength(1);
    const [line] = lines;
    expect(line).toMatchObject({ level: 30, msg: "GET /ok 200", req: { method: "GET", url: "/ok" }, res: { statusCode: 200 } });
    expect(typeof line!.responseTime).toBe("number");
    const text = JSON.stringify(line);
    expect(text).not.toContain("abc.def");
    expect(text).not.toContain("s3cret");
  });

  it("names the path the client asked for, not the one a mounted router sees", async () => {
    const { lines, logger } = capture();
    await request(appWith(logger)).get("/api/health");
    expect(lines[0]).toMatchObject({ msg: "GET /api/health 200", req: { url: "/api/health" } });
  });

  it("logs server errors at error level and client errors at info", async () => {
    const { lines, logger } = capture();
    const app = appWith(logger);
    await request(app).get("/missing");
    await request(app).get("/broken");
    expect(lines.map((l) => [l.msg, l.level])).toEqual([
      ["GET /missing 404", 30],
      ["GET /broken 500 failed", 50],
    ]);
  });

  it("never writes a reset token from the query string", async () => {
    const { lines, logger } = capture();
    await request(appWith(logger)).get("/ok?token=reset-123&next=%2Fruns");
    expect(JSON.stringify(lines)).not.toContain("reset-123");
    expect(redactUrl("/reset-password?token=abc&x=1")).toBe("/reset-password?token=[redacted]&x=1");
  });

  it("sends the request id back so a complaint can be matched with its line", async () => {
    const { lines, logger } = capture();
    const res = await request(appWith(logger)).get("/ok");
    expect(res.headers["x-request-id"]).toMatch(/^[0-9a-f-]{36}$/);
    expect((lines[0]!.req as { id: string }).id).toBe(res.headers["x-request-id"]);
  });
});

describe("logger redaction", () => {
  it("replaces passwords, tokens and cookies logged by hand", () => {
    const { lines, logger } = capture();
    logger.info({ user: { email: "a@b.example", password: "hunter22" }, reset: { token: "t-1" }, req: { headers: { cookie: "c=1", authorization: "Bearer x" } } }, "by hand");
    const [line] = lines;
    expect(line).toMatchObject({
      user: { email: "a@b.example", password: "[redacted]" },
      reset: { token: "[redacted]" },
      req: { headers: { cookie: "[redacted]", authorization: "[redacted]" } },
    });
  });
});
