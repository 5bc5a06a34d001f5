import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, demoUser, TEST_ORIGIN, type TestContext } from "../../test-support/test-context.js";

let t: TestContext;
let admin: SignedInAgent;
let analyst: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  admin = await signIn(t.app, "admin");
  analyst = await signIn(t.app, "analyst");
});
afterAll(async () => {
  await t.close();
});

describe("GET /api/users", () => {
  it("lists every user for an admin", async () => {
    const res = await admin.get("/api/users");
    expect(res.status).toBe(200);
    expect(res.body.map((u: { email: string }) => u.email)).toEqual(expect.arrayContaining([demoUser("analyst").email, demoUser("manager2").email]));
    expect(res.body[0]).toEqual({ id: expect.any(String), email: expect.any(String), name: expect.any(String), role: expect.any(String), createdAt: expect.any(String), deactivated: false });
  });

  it("answers 401 without a session", async () => {
    const res = await request(t.app).get("/api/users");
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe("unauthenticated");
  });

  it("answers 403 naming the permission for a role without users:manage", async () => {
    const res = await analyst.get("/api/users");
    expect(res.status).toBe(403);
    expect(res.body.error.message).toContain("users:manage");
  });
});

// The invitation reuses better-auth's reset token (its email-and-password documentation: a
// one-time token through sendResetPassword, consumed by POST /reset-password); OWASP's
// Forgot Password Cheat Sheet: send a single-use link, never a password, by mail.

/** The mail the outbox holds for `email` (the latest one), read back as an admin would. */
async function latestMailTo(email: string): Promise<{ subject: string; text: string }> {
  await t.ctx.mailer.idle();
  const list = await admin.get("/api/outbox");
  expect(list.status).toBe(200);
  const summary = list.body.find((m: { to: string[] }) => m.to.includes(email));
  expect(summary).toBeDefined();
  const mail = await admin.get(`/api/outbox/${summary.id}`);
  expect(mail.status).toBe(200);
  return mail.body;
}

function resetTokenIn(text: string): string {
  const link = /(http\S+\/reset-password\?token=\S+)/.exec(text)?.[1];
  if (!link) throw new Error(`No link to set a password in: ${text}`);
  expect(link.startsWith(`${TEST_ORIGIN}/reset-password?`)).toBe(true);
  return new URL(link).searchParams.get("token")!;
}

const signInAs = (email: string, password: string) =>
  request(t.app).post("/api/auth/sign-in/email").set("Origin", TEST_ORIGIN).send({ email, password });

describe("POST /api/users (invite)", () => {
  it("creates the user, audits it and mails a one-time link to set a password, never a password", async () => {
    const res = await admin.post("/api/users").send({ email: "Noor.Castellan@harbourline.example", name: "Noor Castellan", role: "actuary" });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email: "noor.castellan@harbourline.example", name: "Noor Castellan", role: "actuary" });

    const mail = await latestMailTo("noor.castellan@harbourline.example");
    expect(mail.subject).toBe("You are invited to Plumeline");
    expect(mail.text).toContain("as actuary");
    expect(mail.text).not.toMatch(/password:/i);
    resetTokenIn(mail.text);
    // Nothing signs the invited person in before they choose a password: there is none.
    expect(await t.ctx.models.Account.count({ where: { userId: res.body.id } })).toBe(0);

    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "user.invited", entityId: res.body.id } });
    expect(audit?.actorId).toBe(t.userIds.admin);
  });

  it("answers 400 listing every bad field", async () => {
    const res = await admin.post("/api/users").send({ email: "not-an-email", role: "superuser" });
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(["email", "name", "role"]);
  });

  it("answers 409 for an email that already has an account", async () => {
    const res = await admin.post("/api/users").send({ email: demoUser("manager").email, name: "Someone", role: "analyst" });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("email_taken");
  });

  it("answers 403 for a non-admin", async () => {
    const res = await analyst.post("/api/users").send({ email: "x@harbourline.example", name: "X", role: "analyst" });
    expect(res.status).toBe(403);
  });
});

describe("better-auth admin endpoints over HTTP", () => {
  it("are closed, so role changes cannot bypass the audited /api/users path", async () => {
    const res = await admin.post("/api/auth/admin/set-role").send({ userId: t.userIds.analyst, role: "manager" });
    expect(res.status).toBe(404);
    expect((await t.ctx.models.User.findByPk(t.userIds.analyst))?.role).toBe("analyst");
  });
});

describe("PATCH /api/users/:id", () => {
  it("changes the role, audits old and new role with the reason, and the new permissions apply at once", async () => {
    const actuaryAgent = await signIn(t.app, "actuary");
    expect((await actuaryAgent.get("/api/me")).body.permissions).not.toContain("pathways:write");

    const reason = "Moves to the pricing desk; needs to draft pathways.";
    const res = await admin.patch(`/api/users/${t.userIds.actuary}`).send({ role: "analyst", reason });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe("analyst");

    const audit = await admin.get(`/api/audit?action=user.role-changed&entityId=${t.userIds.actuary}`);
    expect(audit.body.total).toBe(1);
    expect(audit.body.items[0].data).toEqual({ from: "actuary", to: "analyst", reason });
    expect(audit.body.items[0].summary).toContain(reason);
    expect((await actuaryAgent.get("/api/me")).body.permissions).toContain("pathways:write");
  });

  it("answers 400 naming reason when it is missing or blank, and changes nothing", async () => {
    for (const body of [{ role: "manager" }, { role: "manager", reason: "   " }]) {
      const res = await admin.patch(`/api/users/${t.userIds.manager2}`).send(body);
      expect(res.status).toBe(400);
      expect(res.body.error.details.map((d: { path: string }) => d.path)).toEqual(["reason"]);
    }
    expect((await t.ctx.models.User.findByPk(t.userIds.manager2))?.role).toBe("manager");
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "user.role-changed", entityId: t.userIds.manager2 } })).toBe(0);
  });

  it("refuses an admin changing their own role (403 self_role_change) and leaves it unchanged", async () => {
    const res = await admin.patch(`/api/users/${t.userIds.admin}`).send({ role: "manager", reason: "Stepping back from admin." });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("self_role_change");
    expect((await t.ctx.models.User.findByPk(t.userIds.admin))?.role).toBe("admin");
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "user.role-changed", entityId: t.userIds.admin } })).toBe(0);
  });

  it("answers 404 for an unknown user", async () => {
    const res = await admin.patch("/api/users/no-such-user").send({ role: "analyst", reason: "Test of an unknown id." });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not_found");
  });

  it("answers 400 for an unknown role and 401 without a session", async () => {
    expect((await admin.patch(`/api/users/${t.userIds.manager}`).send({ role: "owner", reason: "Not a role." })).status).toBe(400);
    expect((await request(t.app).patch(`/api/users/${t.userIds.manager}`).send({ role: "analyst", reason: "No session." })).status).toBe(401);
  });

  it("refuses a cookie-authenticated write from an untrusted origin", async () => {
    const res = await admin.patch(`/api/users/${t.userIds.manager}`).set("Origin", "https://attacker.example").send({ role: "analyst", reason: "Forged." });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("untrusted_origin");
  });
});

describe("invited user's link to set a password", () => {
  it("sets a password once: it signs in with no further step, the link cannot be used again, audited without secrets", async () => {
    const email = "lior.vantongeren@harbourline.example";
    const invited = await admin.post("/api/users").send({ email, name: "Lior Vantongeren", role: "manager" });
    expect(invited.status).toBe(201);
    const token = resetTokenIn((await latestMailTo(email)).text);

    const chosen = "lior-own-password-2";
    const set = await request(t.app).post("/api/auth/reset-password").set("Origin", TEST_ORIGIN).send({ token, newPassword: chosen });
    expect(set.status).toBe(200);

    const agent = request.agent(t.app);
    agent.set("Origin", TEST_ORIGIN);
    expect((await agent.post("/api/auth/sign-in/email").send({ email, password: chosen })).status).toBe(200);
    const me = await agent.get("/api/me");
    expect(me.body.mustChangePassword).toBe(false);
    expect((await agent.get("/api/pathways")).status).toBe(200);

    const reuse = await request(t.app).post("/api/auth/reset-password").set("Origin", TEST_ORIGIN).send({ token, newPassword: "someone-else-pw-3" });
    expect(reuse.status).toBe(400);
    expect(reuse.body.code).toBe("INVALID_TOKEN");
    expect((await signInAs(email, "someone-else-pw-3")).status).toBe(401);
    expect((await signInAs(email, chosen)).status).toBe(200);

    const rows = await t.ctx.models.AuditEvent.findAll({ where: { entityId: invited.body.id } });
    expect(rows.map((r) => r.action)).toEqual(expect.arrayContaining(["user.invited", "user.password-reset"]));
    const stored = JSON.stringify(rows.map((r) => r.toJSON()));
    expect(stored).not.toContain(token);
    expect(stored).not.toContain(chosen);
  });
});
