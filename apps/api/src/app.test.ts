import { mkdir, writeFile } from "node:fs/promises";
import path from "node:path";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createApp } from "./app.js";
import { createTestContext, type TestContext } from "./test-support/test-context.js";

let t: TestContext;
let webDist: string;
beforeAll(async () => {
  t = await createTestContext();
  webDist = path.join(t.dataDir, "web-dist");
  await mkdir(path.join(webDist, "assets"), { recursive: true });
  await writeFile(path.join(webDist, "index.html"), "<!doctype html><title>Plumeline</title><div id=root></div>");
  await writeFile(path.join(webDist, "assets", "app.js"), "console.log('plumeline')");
});
afterAll(async () => {
  await t.close();
});

describe("one port: the web build and the API", () => {
  it("serves built files, falls back to index.html for app routes, and keeps /api JSON", async () => {
    const app = createApp({ ...t.ctx, config: { ...t.ctx.config, webDist } });
    const asset = await request(app).get("/assets/app.js");
    expect(asset.status).toBe(200);
    expect(asset.text).toContain("plumeline");
    const deepLink = await request(app).get("/runs/42/results");
    expect(deepLink.status).toBe(200);
    expect(deepLink.text).toContain("<div id=root>");
    const api = await request(app).get("/api/nothing-here");
    expect(api.status).toBe(404);
    expect(api.body.error.code).toBe("not_found");
  });

  it("sets security headers (helmet)", async () => {
    const res = await request(t.app).get("/api/health");
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
    expect(res.headers["content-security-policy"]).toBeDefined();
    expect(res.headers["x-powered-by"]).toBeUndefined();
  });
});
