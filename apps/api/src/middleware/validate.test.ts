import express, { type Response } from "express";
import request from "supertest";
import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { errorHandler } from "../errors/error-handler.js";
import { logger } from "../logging/logger.js";
import { validate, validated } from "./validate.js";

// A stand-in route with its own small schemas: the point is the middleware's contract (what a
// controller reads, what a client is told), not any one module's fields.
const input = {
  params: z.object({ id: z.string().min(1) }),
  query: z.object({ limit: z.coerce.number().int().min(1).default(20) }),
  body: z.object({ name: z.string().trim().min(1, "must not be empty") }),
};

function appWith(read: (res: Response) => unknown) {
  const app = express();
  app.use(express.json());
  app.post("/things/:id", validate(input), (req, res) => {
    res.json({ read: read(res), rawQuery: req.query, rawBody: req.body as unknown });
  });
  app.use(errorHandler);
  return app;
}

describe("validate + validated", () => {
  it("hands the controller the parsed values (coerced, defaulted, trimmed) and leaves the raw request alone", async () => {
    const res = await request(appWith((r) => validated(r, input)))
      .post("/things/t-1?limit=5")
      .send({ name: "  Harbourline  " });
    expect(res.status).toBe(200);
    expect(res.body.read).toEqual({ params: { id: "t-1" }, query: { limit: 5 }, body: { name: "Harbourline" } });
    expect(res.body.rawQuery).toEqual({ limit: "5" });
    expect(res.body.rawBody).toEqual({ name: "  Harbourline  " });

    const defaulted = await request(appWith((r) => validated(r, input).query.limit))
      .post("/things/t-1")
      .send({ name: "x" });
    expect(defaulted.body.read).toBe(20);
  });

  it("lists every bad field of every part in one 400, and the controller never runs", async () => {
    const reached = vi.fn();
    const res = await request(appWith(reached)).post("/things/t-1?limit=0").send({ name: " " });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("validation_failed");
    expect(res.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(["limit", "name"]);
    expect(reached).not.toHaveBeenCalled();
  });

  it("names the whole part when the part itself is wrong (a body that is not an object)", async () => {
    const res = await request(appWith(() => null))
      .post("/things/t-1")
      .set("Content-Type", "application/json")
      .send("[1,2]");
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([{ path: "body", message: expect.any(String) }]);
  });

  it("refuses to hand out values checked by other schemas: a miswired route fails loudly (500), not with unchecked data", async () => {
    const other = { body: input.body };
    const quiet = vi.spyOn(logger, "error").mockImplementation(() => undefined);
    try {
      const res = await request(appWith((r) => validated(r, other)))
        .post("/things/t-1")
        .send({ name: "x" });
      expect(res.status).toBe(500);
      expect(quiet).toHaveBeenCalled();
    } finally {
      quiet.mockRestore();
    }
  });
});
