import { mkdir, writeFile } from "node:fs/promises";
import path from "node:path";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createApp } from "./app.js";
import { createPathway } from "./modules/pathways/pathways.service.js";
import { testPathwayBody } from "./modules/runs/runs.fixtures.js";
import { requestUserOf } from "./test-support/request-user.js";
import { signIn } from "./test-support/sign-in.js";
import { createTestContext, type TestContext } from "./test-support/test-context.js";

let t: TestContext;
let webDist: string;
beforeAll(async () => {
  t = await createTestContext();
  webDist = path.join(t.dataDir, "web-dist");
  await mkdir(path.join(webDist, "assets"), { recursive: true });
  await writeFile(path.join(webDist, "index.html"), "<!doctype html><title>Plumeline</title><div id=root></div>");
  // Large enough to be worth compressing (compression leaves bodies under 1 kB alone).
  await writeFile(path.join(webDist, "assets", "app-3f2a9c.js"), `console.log('plumeline');\n${"export const filler = 'fan chart';\n".repeat(200)}`);
});
afterAll(async () => {
  await t.close();
});

describe("one port: the web build and the API", () => {
  it("serves built files, falls back to index.html for app routes, and keeps /api JSON", async () => {
    const app = createApp({ ...t.ctx, config: { ...t.ctx.config, webDist } });
    const asset = await request(app).get("/assets/app-3f2a9c.js");
    expect(asset.status).toBe(200);
    expect(asset.text).toContain("plumeline");
    const deepLink = await request(app).get("/runs/42/results");
    expect(deepLink.status).toBe(200);
    expect(deepLink.text).toContain("<div id=root>");
    const api = await request(app).get("/api/nothing-here");
    expect(api.status).toBe(404);
    expect(api.body.error.code).toBe("not_found");
  });

  it("compresses text assets and API JSON, caches hashed assets for a year and API answers never", async () => {
    const app = createApp({ ...t.ctx, config: { ...t.ctx.config, webDist } });
    const asset = await request(app).get("/assets/app-3f2a9c.js").set("Accept-Encoding", "gzip");
    expect(asset.headers["content-encoding"]).toBe("gzip");
    expect(asset.text).toContain("fan chart"); // supertest inflates: the bytes are the file's
    expect(asset.headers["cache-control"]).toBe("public, max-age=31536000, immutable");
    const brotli = await request(app).get("/assets/app-3f2a9c.js").set("Accept-Encoding", "br");
    expect(brotli.headers["content-encoding"]).toBe("br");
    const index = await request(app).get("/runs/42");
    expect(index.headers["cache-control"]).toBe("no-cache");
    // A pathway's yearly series make its list answer a few kB of JSON.
    const pathway = await createPathway(t.ctx, await requestUserOf(t, "analyst"), testPathwayBody("Compressed ramp"));
    const analyst = await signIn(app, "analyst");
    const one = await analyst.get(`/api/pathways/${pathway.id}`).set("Accept-Encoding", "gzip");
    expect(one.status).toBe(200);
    expect(one.headers["cache-control"]).toBe("no-store");
    expect(one.headers["content-encoding"]).toBe("gzip");
    const health = await request(app).get("/api/health");
    expect(health.headers["cache-control"]).toBe("no-store");
  });

  it("sets security headers (helmet)", async () => {
    const res = await request(t.app).get("/api/health");
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
    expect(res.headers["content-security-policy"]).toBeDefined();
    expect(res.headers["x-powered-by"]).toBeUndefined();
  });
});
