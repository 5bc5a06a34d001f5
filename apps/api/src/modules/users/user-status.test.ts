import { ACCOUNT_DEACTIVATED_MESSAGE } from "@plumeline/contracts";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, demoUser, TEST_ORIGIN, type TestContext } from "../../test-support/test-context.js";

// Expected behaviour comes from better-auth's admin plugin documentation (banning a user
// "prevents them from signing in and revokes all of their existing sessions"; unbanning
// lets them sign in again) and from docs/API.md (POST /api/users/:id/deactivate|reactivate).

let t: TestContext;
let admin: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  admin = await signIn(t.app, "admin");
});
afterAll(async () => {
  await t.close();
});

const actuary = demoUser("actuary");
const signInAs = (email: string, password: string) =>
  request(t.app).post("/api/auth/sign-in/email").set("Origin", TEST_ORIGIN).send({ email, password });

describe("POST /api/users/:id/deactivate and /reactivate", () => {
  it("ends open sessions, refuses sign-in with the deactivation message, keeps history, and reactivation lets them back in", async () => {
    const open = await signIn(t.app, "actuary");
    expect((await open.get("/api/me")).status).toBe(200);

    const res = await admin.post(`/api/users/${t.userIds.actuary}/deactivate`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: t.userIds.actuary, deactivated: true, role: "actuary" });

    // The session opened before is gone at once, in the table and for the API.
    expect(await t.ctx.models.Session.count({ where: { userId: t.userIds.actuary } })).toBe(0);
    expect((await open.get("/api/me")).status).toBe(401);

    const refused = await signInAs(actuary.email, actuary.password);
    expect(refused.status).toBe(403);
    expect(refused.body).toMatchObject({ code: "BANNED_USER", message: ACCOUNT_DEACTIVATED_MESSAGE });

    // Nothing of theirs is removed: still listed, their own earlier sign-in row still names them.
    const listed = (await admin.get("/api/users")).body.find((u: { id: string }) => u.id === t.userIds.actuary);
    expect(listed).toMatchObject({ deactivated: true, email: actuary.email });
    const ownRow = await t.ctx.models.AuditEvent.findOne({ where: { action: "auth.signed-in", actorId: t.userIds.actuary } });
    expect(ownRow).not.toBeNull();

    const back = await admin.post(`/api/users/${t.userIds.actuary}/reactivate`);
    expect(back.status).toBe(200);
    expect(back.body.deactivated).toBe(false);
    expect((await signInAs(actuary.email, actuary.password)).status).toBe(200);

    const audit = await admin.get(`/api/audit?entityId=${t.userIds.actuary}&entityType=user`);
    const actions = audit.body.items.map((i: { action: string }) => i.action);
    expect(actions).toEqual(expect.arrayContaining(["user.deactivated", "user.reactivated"]));
    const deactivated = audit.body.items.find((i: { action: string }) => i.action === "user.deactivated");
    expect(deactivated).toMatchObject({ actorId: t.userIds.admin, data: { email: actuary.email } });
  });

  it("refuses an admin deactivating themselves (403 self_deactivation) and leaves them active", async () => {
    const res = await admin.post(`/api/users/${t.userIds.admin}/deactivate`);
    expect(res.status).toBe(403);
    expect(res.body.error).toMatchObject({ code: "self_deactivation", message: expect.stringContaining("cannot deactivate their own account") });
    expect((await t.ctx.models.User.findByPk(t.userIds.admin))?.banned).toBeFalsy();
    expect((await admin.get("/api/me")).status).toBe(200);
  });

  it("answers 403 naming users:manage for a non-admin, 401 without a session, 404 for an unknown id", async () => {
    const manager = await signIn(t.app, "manager");
    const res = await manager.post(`/api/users/${t.userIds.analyst}/deactivate`);
    expect(res.status).toBe(403);
    expect(res.body.error.message).toContain("users:manage");
    expect((await manager.post(`/api/users/${t.userIds.analyst}/reactivate`)).status).toBe(403);
    expect((await t.ctx.models.User.findByPk(t.userIds.analyst))?.banned).toBeFalsy();

    expect((await request(t.app).post(`/api/users/${t.userIds.analyst}/deactivate`)).status).toBe(401);
    const unknown = await admin.post("/api/users/no-such-user/deactivate");
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe("not_found");
  });

  it("writes no second row when the user already has that status", async () => {
    await admin.post(`/api/users/${t.userIds.manager2}/deactivate`);
    const again = await admin.post(`/api/users/${t.userIds.manager2}/deactivate`);
    expect(again.status).toBe(200);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "user.deactivated", entityId: t.userIds.manager2 } })).toBe(1);
  });
});
