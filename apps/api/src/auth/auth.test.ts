import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn } from "../test-support/sign-in.js";
import { createTestContext, demoUser, TEST_ORIGIN, type TestContext } from "../test-support/test-context.js";

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(async () => {
  await t.close();
});

describe("sign-in (better-auth on the Sequelize adapter)", () => {
  it("signs in with the right password and sets an httpOnly, SameSite=Lax session cookie", async () => {
    const analyst = demoUser("analyst");
    const res = await request(t.app)
      .post("/api/auth/sign-in/email")
      .set("Origin", TEST_ORIGIN)
      .send({ email: analyst.email, password: analyst.password });
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe(analyst.email);
    const cookie = ([] as string[]).concat(res.headers["set-cookie"] ?? []).find((c) => c.includes("session_token"));
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    // Served over http in tests, so the cookie must not be marked Secure (it would never be sent back).
    expect(cookie).not.toMatch(/;\s*Secure/i);
    const session = await t.ctx.models.Session.findOne({ where: { userId: t.userIds.analyst } });
    expect(session).not.toBeNull();
  });

  it("refuses a wrong password with 401 and appends an audit row naming the address", async () => {
    const before = await t.ctx.models.AuditEvent.count({ where: { action: "auth.sign-in-failed" } });
    const res = await request(t.app)
      .post("/api/auth/sign-in/email")
      .set("Origin", TEST_ORIGIN)
      .send({ email: demoUser("actuary").email, password: "not-the-password" });
    expect(res.status).toBe(401);
    const rows = await t.ctx.models.AuditEvent.findAll({ where: { action: "auth.sign-in-failed" }, order: [["id", "DESC"]] });
    expect(rows.length).toBe(before + 1);
    expect(rows[0]!.actorEmail).toBe(demoUser("actuary").email);
    expect(rows[0]!.summary).toContain(demoUser("actuary").email);
    expect((rows[0]!.data as { ipAddress: string }).ipAddress).toMatch(/127\.0\.0\.1|::1/);
  });

  it("appends an auth.signed-in row per successful sign-in, readable by an admin through GET /api/audit", async () => {
    // Checks the product's governance rule (README "Cautions"; docs/API.md, audit): the audit log is
    // append-only and admins read the trail; a sign-in is who-did-what too. The row must hold the person and their IP like
    // a failure row does, and nothing of the password or the session token.
    const manager = demoUser("manager");
    const res = await request(t.app)
      .post("/api/auth/sign-in/email")
      .set("Origin", TEST_ORIGIN)
      .send({ email: manager.email, password: manager.password });
    expect(res.status).toBe(200);
    const admin = await signIn(t.app, "admin");
    const audit = await admin.get(`/api/audit?action=auth.signed-in&actorId=${t.userIds.manager}`);
    expect(audit.status).toBe(200);
    expect(audit.body.total).toBe(1);
    const row = audit.body.items[0];
    expect(row).toMatchObject({ actorEmail: manager.email, entityType: "user", entityId: t.userIds.manager });
    expect(row.data.ipAddress).toMatch(/127\.0\.0\.1|::1/);
    const token = await t.ctx.models.Session.findOne({ where: { userId: t.userIds.manager }, order: [["createdAt", "DESC"]] });
    expect(token).not.toBeNull();
    const stored = JSON.stringify(row);
    expect(stored).not.toContain(manager.password);
    expect(stored).not.toContain(token!.token);
    // The admin's own sign-in above is recorded too; a refused one is not counted as a sign-in.
    expect((await admin.get(`/api/audit?action=auth.signed-in&actorId=${t.userIds.admin}`)).body.total).toBe(1);
    await request(t.app).post("/api/auth/sign-in/email").set("Origin", TEST_ORIGIN).send({ email: manager.email, password: "not-the-password" });
    expect((await admin.get(`/api/audit?action=auth.signed-in&actorId=${t.userIds.manager}`)).body.total).toBe(1);
  });

  it("refuses sign-up: only admins create accounts", async () => {
    const res = await request(t.app)
      .post("/api/auth/sign-up/email")
      .set("Origin", TEST_ORIGIN)
      .send({ email: "stranger@elsewhere.example", password: "a-long-password-1", name: "Stranger" });
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(await t.ctx.models.User.count({ where: { email: "stranger@elsewhere.example" } })).toBe(0);
  });

  it("refuses a sign-in POST from an untrusted origin", async () => {
    const analyst = demoUser("analyst");
    const res = await request(t.app)
      .post("/api/auth/sign-in/email")
      .set("Origin", "https://attacker.example")
      .send({ email: analyst.email, password: analyst.password });
    expect(res.status).toBe(403);
  });

  it("gives the signed-in agent a session that GET /api/me resolves", async () => {
    const agent = await signIn(t.app, "manager");
    const res = await agent.get("/api/me");
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: demoUser("manager").email, role: "manager" });
    expect(res.body.permissions).toContain("model-versions:decide");
    expect(res.body.permissions).not.toContain("users:manage");
  });

  it("signs out: the old cookie no longer opens /api/me", async () => {
    const agent = await signIn(t.app, "actuary");
    expect((await agent.post("/api/auth/sign-out").send({})).status).toBe(200);
    expect((await agent.get("/api/me")).status).toBe(401);
  });
});
