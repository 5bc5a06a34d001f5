import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadConfig, ConfigError } from "../config.js";
import { createTestContext, demoUser, TEST_ORIGIN, type TestContext } from "../test-support/test-context.js";
import { testPathwayBody } from "../modules/runs/runs.fixtures.js";

let t: TestContext;
let cookie: string;
beforeAll(async () => {
  t = await createTestContext();
  // A real session cookie, sent by hand below so no Origin goes with it.
  const user = demoUser("analyst");
  const res = await request(t.app).post("/api/auth/sign-in/email").set("Origin", TEST_ORIGIN).send({ email: user.email, password: user.password });
  cookie = (res.headers["set-cookie"] as unknown as string[]).map((c) => c.split(";")[0]).join("; ");
});
afterAll(async () => t.close());

describe("cookie-authenticated writes must say where they come from", () => {
  it("refuses a state-changing request with a session cookie but neither Origin nor Sec-Fetch-Site (403)", async () => {
    expect(cookie).toMatch(/session_token/);
    const res = await request(t.app).post("/api/pathways").set("Cookie", cookie).send(testPathwayBody("No origin"));
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("origin_required");
  });

  it("accepts Sec-Fetch-Site: same-origin without Origin, and refuses cross-site", async () => {
    const same = await request(t.app).post("/api/pathways").set("Cookie", cookie).set("Sec-Fetch-Site", "same-origin").send(testPathwayBody("Same origin"));
    expect(same.status).toBe(201);
    const cross = await request(t.app).post("/api/pathways").set("Cookie", cookie).set("Sec-Fetch-Site", "cross-site").send(testPathwayBody("Cross site"));
    expect(cross.status).toBe(403);
  });

  it("lets reads through without either header", async () => {
    expect((await request(t.app).get("/api/pathways").set("Cookie", cookie)).status).toBe(200);
  });
});

describe("headers", () => {
  it("sends a Permissions-Policy that turns off powerful browser features", async () => {
    const res = await request(t.app).get("/api/health");
    expect(res.headers["permissions-policy"]).toMatch(/camera=\(\)/);
    expect(res.headers["permissions-policy"]).toMatch(/geolocation=\(\)/);
  });
});

describe("trusted origins and the public origin", () => {
  const base = { PLUMELINE_DATA_DIR: t?.dataDir ?? "/tmp/plumeline-config-origins", AUTH_SECRET: "x".repeat(40) };

  it("trusts the Vite dev server and 127.0.0.1 in development only", () => {
    const dev = loadConfig({ ...base, NODE_ENV: "development", PORT: "4300" });
    expect(dev.trustedOrigins).toEqual(expect.arrayContaining(["http://localhost:5173", "http://127.0.0.1:4300"]));
    const prod = loadConfig({ ...base, NODE_ENV: "production", PORT: "4300", PUBLIC_ORIGIN: "https://plumeline.harbourline.example" });
    expect(prod.trustedOrigins).toEqual(["https://plumeline.harbourline.example"]);
  });

  it("requires PUBLIC_ORIGIN in production, so mailed links never point at whichever process ran the job", () => {
    expect(() => loadConfig({ ...base, NODE_ENV: "production" })).toThrow(ConfigError);
    expect(() => loadConfig({ ...base, NODE_ENV: "production" })).toThrow(/PUBLIC_ORIGIN/);
  });
});
