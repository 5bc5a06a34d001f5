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

describe("POST /api/users (invite)", () => {
  it("creates the user, audits it and mails a password that signs them in (read back through the outbox API)", async () => {
    const res = await admin.post("/api/users").send({ email: "Noor.Castellan@harbourline.example", name: "Noor Castellan", role: "actuary" });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email: "noor.castellan@harbourline.example", name: "Noor Castellan", role: "actuary" });

    const list = await admin.get("/api/outbox");
    expect(list.status).toBe(200);
    const summary = list.body.find((m: { to: string[] }) => m.to.includes("noor.castellan@harbourline.example"));
    expect(summary).toBeDefined();
    const mail = await admin.get(`/api/outbox/${summary.id}`);
    expect(mail.status).toBe(200);
    const password = /password:\s+(\S+)/.exec(mail.body.text)?.[1];
    expect(password).toBeDefined();

    const signInRes = await request(t.app)
      .post("/api/auth/sign-in/email")
      .set("Origin", TEST_ORIGIN)
      .send({ email: "noor.castellan@harbourline.example", password });
    expect(signInRes.status).toBe(200);

    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "user.invited", entityId: res.body.id } });
    expect(audit?.actorId).toBe(t.userIds.admin);
    expect(JSON.stringify(audit?.data)).not.toContain(password!);
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
  it("changes the role, audits old and new role, and the new permissions apply at once", async () => {
    const actuaryAgent = await signIn(t.app, "actuary");
    expect((await actuaryAgent.get("/api/me")).body.permissions).not.toContain("pathways:write");

    const res = await admin.patch(`/api/users/${t.userIds.actuary}`).send({ role: "analyst" });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe("analyst");

    const audit = await admin.get(`/api/audit?action=user.role-changed&entityId=${t.userIds.actuary}`);
    expect(audit.body.total).toBe(1);
    expect(audit.body.items[0].data).toEqual({ from: "actuary", to: "analyst" });
    expect((await actuaryAgent.get("/api/me")).body.permissions).toContain("pathways:write");
  });

  it("refuses an admin removing their own admin role (403) and leaves it unchanged", async () => {
    const res = await admin.patch(`/api/users/${t.userIds.admin}`).send({ role: "manager" });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("self_demotion");
    expect((await t.ctx.models.User.findByPk(t.userIds.admin))?.role).toBe("admin");
  });

  it("answers 404 for an unknown user", async () => {
    const res = await admin.patch("/api/users/no-such-user").send({ role: "analyst" });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not_found");
  });

  it("answers 400 for an unknown role and 401 without a session", async () => {
    expect((await admin.patch(`/api/users/${t.userIds.manager}`).send({ role: "owner" })).status).toBe(400);
    expect((await request(t.app).patch(`/api/users/${t.userIds.manager}`).send({ role: "analyst" })).status).toBe(401);
  });

  it("refuses a cookie-authenticated write from an untrusted origin", async () => {
    const res = await admin.patch(`/api/users/${t.userIds.manager}`).set("Origin", "https://attacker.example").send({ role: "analyst" });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("untrusted_origin");
  });
});

describe("invited user's one-time password", () => {
  it("opens only /api/me until the user picks their own password; the change is audited", async () => {
    const invited = await admin.post("/api/users").send({ email: "lior.vantongeren@harbourline.example", name: "Lior Vantongeren", role: "manager" });
    expect(invited.status).toBe(201);
    const list = await admin.get("/api/outbox");
    const summary = list.body.find((m: { to: string[] }) => m.to.includes("lior.vantongeren@harbourline.example"));
    const mail = await admin.get(`/api/outbox/${summary.id}`);
    const mailed = /password:\s+(\S+)/.exec(mail.body.text)![1]!;

    const agent = request.agent(t.app);
    agent.set("Origin", TEST_ORIGIN);
    expect((await agent.post("/api/auth/sign-in/email").send({ email: "lior.vantongeren@harbourline.example", password: mailed })).status).toBe(200);
    const me = await agent.get("/api/me");
    expect(me.status).toBe(200);
    expect(me.body.mustChangePassword).toBe(true);
    const blocked = await agent.get("/api/audit");
    expect(blocked.status).toBe(403);
    expect(blocked.body.error.code).toBe("password_change_required");

    const changed = await agent.post("/api/auth/change-password").send({ currentPassword: mailed, newPassword: "lior-own-password-2" });
    expect(changed.status).toBe(200);
    expect((await agent.get("/api/me")).body.mustChangePassword).toBe(false);
    expect((await agent.get("/api/audit")).status).toBe(200);
    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "user.password-changed", entityId: invited.body.id } });
    expect(audit).not.toBeNull();

    // The mailed password no longer signs in.
    const reuse = await request(t.app).post("/api/auth/sign-in/email").set("Origin", TEST_ORIGIN).send({ email: "lior.vantongeren@harbourline.example", password: mailed });
    expect(reuse.status).toBe(401);
  });
});
