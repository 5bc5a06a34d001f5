import { QueryTypes } from "sequelize";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { AuditAppendOnlyError } from "./audit-event.model.js";
import { recordAudit } from "./audit.service.js";

let t: TestContext;
let manager: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  manager = await signIn(t.app, "manager");
  for (let i = 1; i <= 5; i += 1) {
    await recordAudit(t.ctx, { actorId: t.userIds.analyst, action: "pathway.created", entityType: "pathway", entityId: `p${i}`, summary: `Pathway p${i} created.` });
  }
  await recordAudit(t.ctx, { actorId: t.userIds.manager, action: "model-version.approved", entityType: "model-version", entityId: 7, summary: "Version 7 approved.", data: { comment: "ok" } });
});
afterAll(async () => {
  await t.close();
});

describe("audit trail is append-only", () => {
  it("fills in the actor's email and stores data as JSON", async () => {
    const row = await t.ctx.models.AuditEvent.findOne({ where: { action: "model-version.approved" } });
    expect(row?.actorEmail).toBe("manager@harbourline.example");
    expect(row?.data).toEqual({ comment: "ok" });
    expect(row?.entityId).toBe("7");
  });

  it("refuses instance and bulk updates and deletes through the model", async () => {
    const row = (await t.ctx.models.AuditEvent.findOne({ where: { entityId: "p1" } }))!;
    await expect(row.update({ summary: "rewritten" })).rejects.toBeInstanceOf(AuditAppendOnlyError);
    await expect(row.destroy()).rejects.toBeInstanceOf(AuditAppendOnlyError);
    await expect(t.ctx.models.AuditEvent.update({ summary: "rewritten" }, { where: {} })).rejects.toBeInstanceOf(AuditAppendOnlyError);
    await expect(t.ctx.models.AuditEvent.destroy({ where: {} })).rejects.toBeInstanceOf(AuditAppendOnlyError);
  });

  it("refuses raw SQL updates and deletes in the database itself", async () => {
    // The trigger's RAISE(ABORT) reaches Sequelize as a constraint error wrapping SQLite's message.
    const refusedBySqlite = { parent: expect.objectContaining({ message: expect.stringMatching(/audit_events is append-only/) }) };
    await expect(t.ctx.sequelize.query("UPDATE audit_events SET summary = 'rewritten'")).rejects.toMatchObject(refusedBySqlite);
    await expect(t.ctx.sequelize.query("DELETE FROM audit_events")).rejects.toMatchObject(refusedBySqlite);
    const [row] = await t.ctx.sequelize.query<{ n: number }>("SELECT count(*) AS n FROM audit_events WHERE summary = 'rewritten'", { type: QueryTypes.SELECT });
    expect(row?.n).toBe(0);
  });

  it("rolls the audit row back with the transaction it belongs to", async () => {
    const before = await t.ctx.models.AuditEvent.count();
    await expect(
      t.ctx.sequelize.transaction(async (transaction) => {
        await recordAudit(t.ctx, { actorId: null, action: "test.rolled-back", entityType: "test", summary: "never kept" }, transaction);
        throw new Error("abort");
      }),
    ).rejects.toThrow("abort");
    expect(await t.ctx.models.AuditEvent.count()).toBe(before);
  });
});

describe("GET /api/audit", () => {
  it("filters by action and entity and pages newest first with the total", async () => {
    const page1 = await manager.get("/api/audit?action=pathway.created&limit=2");
    expect(page1.status).toBe(200);
    expect(page1.body.total).toBe(5);
    expect(page1.body.items.map((e: { entityId: string }) => e.entityId)).toEqual(["p5", "p4"]);
    const page3 = await manager.get("/api/audit?action=pathway.created&limit=2&offset=4");
    expect(page3.body.items.map((e: { entityId: string }) => e.entityId)).toEqual(["p1"]);
    const one = await manager.get("/api/audit?entityType=model-version&entityId=7");
    expect(one.body.total).toBe(1);
    expect(one.body.items[0]).toMatchObject({ action: "model-version.approved", actorId: t.userIds.manager });
  });

  it("filters by actor and by date range", async () => {
    const byActor = await manager.get(`/api/audit?actorId=${t.userIds.manager}`);
    expect(byActor.body.items.every((e: { actorId: string }) => e.actorId === t.userIds.manager)).toBe(true);
    const today = new Date().toISOString().slice(0, 10);
    expect((await manager.get(`/api/audit?from=${today}&to=${today}&action=pathway.created`)).body.total).toBe(5);
    expect((await manager.get("/api/audit?to=2000-01-01")).body.total).toBe(0);
  });

  it("answers 400 listing each bad query field", async () => {
    const res = await manager.get("/api/audit?limit=0&from=yesterday");
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(["from", "limit"]);
  });

  it("answers 401 without a session and 403 for roles without audit:read", async () => {
    expect((await request(t.app).get("/api/audit")).status).toBe(401);
    const analyst = await signIn(t.app, "analyst");
    const res = await analyst.get("/api/audit");
    expect(res.status).toBe(403);
    expect(res.body.error.message).toContain("audit:read");
    const admin = await signIn(t.app, "admin");
    expect((await admin.get("/api/audit")).status).toBe(200);
  });
});
