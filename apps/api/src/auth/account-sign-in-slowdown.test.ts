import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, demoUser, TEST_ORIGIN, type TestContext } from "../test-support/test-context.js";
import { FAILURES_BEFORE_SLOWDOWN } from "./account-sign-in-slowdown.js";

// Sign-in failures used to be limited per IP only: many addresses could guess one account's
// password. Repeated failures for one address now slow that address down, audited, and an
// unknown address gets exactly the same answers (nothing tells whether an account exists).

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(async () => t.close());

const attempt = (email: string, password: string, ip: string) =>
  request(t.app).post("/api/auth/sign-in/email").set("Origin", TEST_ORIGIN).set("X-Forwarded-For", ip).send({ email, password });

describe("per-account sign-in slow-down", () => {
  it("refuses an address after repeated failures, even with the right password and from fresh IPs, and audits it", async () => {
    const analyst = demoUser("analyst");
    for (let i = 0; i < FAILURES_BEFORE_SLOWDOWN; i++) expect((await attempt(analyst.email, `wrong-${i}-password`, `10.0.0.${i}`)).status).toBe(401);
    const slowed = await attempt(analyst.email, analyst.password, "10.0.1.1");
    expect(slowed.status).toBe(429);
    expect(slowed.body.code).toBe("SIGN_IN_SLOWED");
    expect(slowed.body.message).toMatch(/Too many failed sign-ins for this address\. Try again in \d+ seconds\./);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "auth.sign-in-slowed", actorEmail: analyst.email } })).toBe(1);
  });

  it("answers an unknown address exactly as a known one, so the slow-down reveals nothing", async () => {
    const known = demoUser("actuary").email;
    const unknown = "nobody-here@harbourline.example";
    const answers = async (email: string) => {
      const out: Array<{ status: number; code: unknown }> = [];
      for (let i = 0; i <= FAILURES_BEFORE_SLOWDOWN; i++) {
        const res = await attempt(email, `wrong-${i}-password`, `10.0.2.${i}`);
        out.push({ status: res.status, code: res.body.code });
      }
      return out;
    };
    expect(await answers(unknown)).toEqual(await answers(known));
  });
});
