import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, demoUser, type TestContext } from "../test-support/test-context.js";

const HTTPS_ORIGIN = "https://risk.harbourline.example";
let t: TestContext;
beforeAll(async () => {
  t = await createTestContext({ PUBLIC_ORIGIN: HTTPS_ORIGIN });
});
afterAll(async () => {
  await t.close();
});

describe("session cookie when served over https", () => {
  it("is Secure, HttpOnly and SameSite=Lax", async () => {
    const analyst = demoUser("analyst");
    const res = await request(t.app).post("/api/auth/sign-in/email").set("Origin", HTTPS_ORIGIN).send({ email: analyst.email, password: analyst.password });
    expect(res.status).toBe(200);
    const cookie = ([] as string[]).concat(res.headers["set-cookie"] ?? []).find((c) => c.includes("session_token"));
    expect(cookie).toMatch(/^__Secure-/);
    expect(cookie).toMatch(/;\s*Secure/i);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });
});
