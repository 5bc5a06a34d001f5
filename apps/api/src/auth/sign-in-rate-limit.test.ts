import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, demoUser, TEST_ORIGIN, type TestContext } from "../test-support/test-context.js";

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext({ SIGN_IN_RATE_LIMIT: "3" });
});
afterAll(async () => {
  await t.close();
});

describe("sign-in rate limit", () => {
  it("answers 429 in the API error shape once the per-minute limit is spent, even for the right password", async () => {
    const analyst = demoUser("analyst");
    const attempt = (password: string) =>
      request(t.app).post("/api/auth/sign-in/email").set("Origin", TEST_ORIGIN).send({ email: analyst.email, password });
    for (let i = 0; i < 3; i += 1) expect((await attempt("wrong-password-123")).status).toBe(401);
    const limited = await attempt(analyst.password);
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe("rate_limited");
  });
});
