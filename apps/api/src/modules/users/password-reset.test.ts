import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, demoUser, TEST_ORIGIN, type TestContext } from "../../test-support/test-context.js";

// Expected behaviour comes from better-auth's email-and-password documentation (POST
// /request-password-reset sends a one-time token through sendResetPassword and answers the
// same whether or not the address exists; POST /reset-password with { newPassword, token }
// sets the password and consumes the token) and from OWASP's Forgot Password Cheat Sheet
// (identical answer for unknown addresses; single-use tokens; end sessions after a reset).

let t: TestContext;
let admin: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  admin = await signIn(t.app, "admin");
});
afterAll(async () => {
  await t.close();
});

const auth = (path: string) => request(t.app).post(`/api/auth${path}`).set("Origin", TEST_ORIGIN);
const requestReset = (email: string) => auth("/request-password-reset").send({ email });
const signInAs = (email: string, password: string) => auth("/sign-in/email").send({ email, password });

/** Every reset mail to `email` the outbox holds, read back as an admin would. */
async function resetMailsTo(email: string): Promise<string[]> {
  await t.ctx.mailer.idle();
  const list = await admin.get("/api/outbox");
  const ours = list.body.filter((m: { to: string[]; subject: string }) => m.to.includes(email) && m.subject === "Reset your Plumeline password");
  return Promise.all(ours.map(async (m: { id: number }) => (await admin.get(`/api/outbox/${m.id}`)).body.text as string));
}

function tokenIn(text: string): string {
  const link = /(http\S+\/reset-password\?token=\S+)/.exec(text)?.[1];
  if (!link) throw new Error(`No reset link in: ${text}`);
  expect(link.startsWith(`${TEST_ORIGIN}/reset-password?`)).toBe(true);
  return new URL(link).searchParams.get("token")!;
}

describe("password reset by mail", () => {
  it("mails a one-time link; the new password signs in, the old one and the used token do not; audited without secrets", async () => {
    const analyst = demoUser("analyst");
    const open = await signIn(t.app, "analyst");
    const res = await requestReset(analyst.email);
    expect(res.status).toBe(200);
    const mails = await resetMailsTo(analyst.email);
    expect(mails).toHaveLength(1);
    const token = tokenIn(mails[0]!);

    const newPassword = "harbour-fresh-start-7";
    const reset = await auth("/reset-password").send({ token, newPassword });
    expect(reset.status).toBe(200);

    expect((await signInAs(analyst.email, newPassword)).status).toBe(200);
    expect((await signInAs(analyst.email, analyst.password)).status).toBe(401);
    // Whoever held a session under the old password is out.
    expect((await open.get("/api/me")).status).toBe(401);

    const reuse = await auth("/reset-password").send({ token, newPassword: "another-password-99" });
    expect(reuse.status).toBe(400);
    expect(reuse.body.code).toBe("INVALID_TOKEN");
    expect((await signInAs(analyst.email, newPassword)).status).toBe(200);

    const row = await t.ctx.models.AuditEvent.findOne({ where: { action: "user.password-reset", entityId: t.userIds.analyst } });
    expect(row?.actorId).toBe(t.userIds.analyst);
    const stored = JSON.stringify(row?.toJSON());
    expect(stored).not.toContain(token);
    expect(stored).not.toContain(newPassword);
  });

  it("answers an unknown address exactly as a known one and mails nothing", async () => {
    const known = await requestReset(demoUser("manager").email);
    const unknown = await requestReset("nobody-here@harbourline.example");
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    expect(await resetMailsTo("nobody-here@harbourline.example")).toHaveLength(0);
  });

  it("keeps the password rules of the rest of the app (10 to 128 characters)", async () => {
    const manager2 = demoUser("manager2");
    await requestReset(manager2.email);
    const token = tokenIn((await resetMailsTo(manager2.email))[0]!);
    const short = await auth("/reset-password").send({ token, newPassword: "too-short" });
    expect(short.status).toBe(400);
    expect(short.body.code).toBe("PASSWORD_TOO_SHORT");
    expect((await signInAs(manager2.email, manager2.password)).status).toBe(200);
  });

  it("gives a deactivated user the same answer but no mail, so a reset is no way back in", async () => {
    const actuary = demoUser("actuary");
    expect((await admin.post(`/api/users/${t.userIds.actuary}/deactivate`)).status).toBe(200);
    const res = await requestReset(actuary.email);
    expect(res.status).toBe(200);
    expect(res.body).toEqual((await requestReset("nobody-else@harbourline.example")).body);
    expect(await resetMailsTo(actuary.email)).toHaveLength(0);
  });

  it("refuses an unknown token", async () => {
    const res = await auth("/reset-password").send({ token: "made-up-token", newPassword: "harbour-fresh-start-8" });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe("INVALID_TOKEN");
  });
});
