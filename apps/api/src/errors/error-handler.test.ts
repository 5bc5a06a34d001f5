import express from "express";
import request from "supertest";
import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { AppError, badRequest, conflict, forbidden, notFound, payloadTooLarge, unauthorized } from "./app-error.js";
import { errorHandler, toErrorResponse } from "./error-handler.js";
import { logger } from "../logging/logger.js";

// The status for each case is the one docs/API.md assigns; the mapping is explicit, so each
// status is checked on its own (a blanket `err.status || 500` would pass some and not others).
describe("error handler status mapping", () => {
  it.each([
    [badRequest([{ path: "email", message: "Invalid email" }]), 400, "validation_failed"],
    [unauthorized(), 401, "unauthenticated"],
    [forbidden("The analyst role lacks the permission audit:read.", "missing_permission"), 403, "missing_permission"],
    [notFound("User", "u-42"), 404, "not_found"],
    [conflict("Version 3 is approved and cannot change.", "immutable"), 409, "immutable"],
    [payloadTooLarge("File larger than 5 MB."), 413, "payload_too_large"],
  ])("maps %s to its status and code", (error, status, code) => {
    const mapped = toErrorResponse(error);
    expect(mapped.status).toBe(status);
    expect(mapped.body.error.code).toBe(code);
    expect(mapped.body.error.message).toBe(error.message);
  });

  it("answers 500 for an AppError whose status is outside the table", () => {
    const odd = new AppError(418 as never, "teapot", "I am a teapot");
    expect(toErrorResponse(odd).status).toBe(500);
  });

  it("maps a ZodError to 400 listing every bad field by path", () => {
    const schema = z.object({ members: z.number().min(1), pathwayIds: z.array(z.string()).min(1) });
    const result = schema.safeParse({ members: 0, pathwayIds: [] });
    expect(result.success).toBe(false);
    const mapped = toErrorResponse(result.error);
    expect(mapped.status).toBe(400);
    expect(mapped.body.error.details?.map((d) => d.path).sort()).toEqual(["members", "pathwayIds"]);
  });

  it("answers 500 with a generic message for anything unexpected, without leaking it", () => {
    const mapped = toErrorResponse(new Error("SQLITE_CORRUPT at /secret/path"));
    expect(mapped.status).toBe(500);
    expect(mapped.body.error.code).toBe("internal_error");
    expect(mapped.body.error.message).not.toContain("secret");
  });
});

describe("error handler in an Express app", () => {
  const app = express();
  app.use(express.json({ limit: "100b" }));
  app.get("/conflict", () => {
    throw conflict("already decided");
  });
  // A rejected promise, as an async handler gives: Express 5 passes it to the error handler.
  app.get("/boom", () => {
    return Promise.reject(new Error("database on fire"));
  });
  app.post("/echo", (req, res) => res.json(req.body));
  app.use(errorHandler);

  it("sends the status and the one error body shape", async () => {
    const res = await request(app).get("/conflict");
    expect(res.status).toBe(409);
    expect(res.body).toEqual({ error: { code: "conflict", message: "already decided" } });
  });

  it("turns a rejected async handler into a logged 500", async () => {
    // This app has no request logger (pino-http), so the handler writes to the process logger.
    const log = vi.spyOn(logger, "error").mockImplementation(() => undefined);
    const res = await request(app).get("/boom");
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe("internal_error");
    expect(log).toHaveBeenCalled();
    log.mockRestore();
  });

  it("answers 400 for malformed JSON and 413 for an oversized body", async () => {
    const malformed = await request(app).post("/echo").set("Content-Type", "application/json").send("{nope");
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.code).toBe("malformed_json");
    const large = await request(app).post("/echo").send({ text: "x".repeat(500) });
    expect(large.status).toBe(413);
    expect(large.body.error.code).toBe("payload_too_large");
  });
});
