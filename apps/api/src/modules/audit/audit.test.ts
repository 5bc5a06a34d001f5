import { QueryTypes } from "sequelize";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { expectBadQuery } from "../../test-support/list-fixtures.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, TEST_ORIGIN, type TestContext } from "../../test-support/test-context.js";
import { testPathwayBody } from "../runs/runs.fixtures.js";
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

  it("names the actor and the entity of each row, and filters by those names", async () => {
    const analyst = await signIn(t.app, "analyst");
    const pathway = await analyst.post("/api/pathways").send(testPathwayBody("Harbour_front ramp"));
    expect(pathway.status).toBe(201);
    const byEntity = await manager.get("/api/audit?entity=harbour_front");
    expect(byEntity.body.total).toBe(1);
    expect(byEntity.body.items[0]).toMatchObject({ action: "pathway.created", entityId: pathway.body.id, entityName: "Harbour_front ramp", actorName: "Ines Calloway" });
    // "_" is literal: "harbourXfront" must not match.
    expect((await manager.get("/api/audit?entity=harbour_fron")).body.total).toBe(1);
    expect((await manager.get("/api/audit?entity=harbourXfront")).body.total).toBe(0);
    // Ines Calloway (the demo analyst) by name and by email; Marit Oyelaran is the manager.
    const byActor = await manager.get("/api/audit?actor=calloway&action=pathway.created");
    expect(byActor.body.total).toBe(6);
    expect((await manager.get("/api/audit?actor=analyst@harbourline&action=pathway.created")).body.total).toBe(6);
    expect((await manager.get("/api/audit?actor=oyelaran&action=pathway.created")).body.total).toBe(0);
    expect((await manager.get("/api/audit?q=oyelaran&action=model-version.approved")).body.total).toBe(1);
    expect((await manager.get("/api/audit?q=version 7 APPROVED")).body.total).toBe(1);
  });

  it("hides successful sign-ins on request and counts them; failed sign-ins stay", async () => {
    await request(t.app).post("/api/auth/sign-in/email").set("Origin", TEST_ORIGIN).send({ email: "nobody@harbourline.example", password: "wrong-password" });
    const all = await manager.get("/api/audit?limit=200");
    const signIns = all.body.items.filter((e: { action: string }) => e.action === "auth.signed-in").length;
    expect(signIns).toBeGreaterThan(0);
    const hidden = await manager.get("/api/audit?limit=200&hideSignIns=true");
    expect(hidden.body.hiddenSignIns).toBe(signIns);
    expect(hidden.body.total).toBe(all.body.total - signIns);
    expect(hidden.body.items.some((e: { action: string }) => e.action === "auth.signed-in")).toBe(false);
    expect(hidden.body.items.some((e: { action: string }) => e.action === "auth.sign-in-failed")).toBe(true);
    expect(all.body.hiddenSignIns).toBe(0);
  });

  it("sorts by action", async () => {
    const actions = (await manager.get("/api/audit?sort=action:asc&limit=200")).body.items.map((e: { action: string }) => e.action);
    expect(actions).toEqual([...actions].sort());
  });

  it("exports the filtered trail as CSV with a header row and ISO UTC times", async () => {
    const res = await manager.get("/api/audit.csv?action=pathway.created&sort=createdAt:asc&limit=1").buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/^text\/csv/);
    expect(res.headers["content-disposition"]).toMatch(/attachment; filename="plumeline-audit-\d{4}-\d{2}-\d{2}\.csv"/);
    const lines = res.text.trimEnd().split("\r\n");
    expect(lines[0]).toBe("time_utc,action,actor_name,actor_email,entity_type,entity_id,entity_name,summary");
    // limit/offset page the screen, not the file: all six pathway rows are in it, oldest first.
    expect(lines).toHaveLength(7);
    expect(lines[1]).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z,pathway\.created,Ines Calloway,analyst@harbourline\.example,pathway,p1,,Pathway p1 created\.$/);
    expect(lines[6]).toMatch(/^[^,]+,pathway\.created,Ines Calloway,analyst@harbourline\.example,pathway,[0-9a-f-]{36},Harbour_front ramp,/);
    await expectBadQuery(manager, "/api/audit.csv?from=2026-02-31", ["from"]);
    expect((await request(t.app).get("/api/audit.csv")).status).toBe(401);
  });

  it("answers 400 listing each bad query field", async () => {
    const res = await manager.get("/api/audit?limit=0&from=yesterday");
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(["from", "limit"]);
    await expectBadQuery(manager, "/api/audit?to=2026-13-01&limit=201&sort=summary:asc&hideSignIns=yes", ["to", "limit", "sort", "hideSignIns"]);
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
