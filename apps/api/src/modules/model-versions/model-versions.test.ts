import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, demoUser, type TestContext } from "../../test-support/test-context.js";
import { testModelVersionBody } from "../runs/runs.fixtures.js";
import { createModelVersion, submitModelVersion } from "./model-versions.service.js";
import { requestUserOf } from "../../test-support/request-user.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let manager: SignedInAgent;
let manager2: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary, manager, manager2] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary"), signIn(t.app, "manager"), signIn(t.app, "manager2")]);
});
afterAll(async () => t.close());

const asUser = (key: "analyst" | "manager" | "manager2") => requestUserOf(t, key);
const outboxTo = async (email: string) => {
  await t.ctx.mailer.idle();
  const rows = await t.ctx.models.OutboxMessage.findAll();
  return rows.filter((m) => JSON.stringify(m.get({ plain: true })).includes(email));
};

describe("model version lifecycle", () => {
  let id: string;

  it("creates a draft (201) with version 1, readable by every role", async () => {
    const res = await analyst.post("/api/model-versions").send(testModelVersionBody());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: "draft", versionNumber: 1, parentId: null, changeClass: null });
    id = res.body.id;
    const read = await actuary.get(`/api/model-versions/${id}`);
    expect(read.status).toBe(200);
    expect(read.body.model.climate.ecs).toMatchObject({ type: "range", p50: 3 });
    expect((await actuary.get("/api/model-versions?status=draft")).body.items.map((v: { id: string }) => v.id)).toContain(id);
  });

  it("answers 401, 403 (no model-versions:write), 400 (every bad field) and 404", async () => {
    expect((await request(t.app).get("/api/model-versions")).status).toBe(401);
    const denied = await manager.post("/api/model-versions").send(testModelVersionBody());
    expect(denied.status).toBe(403);
    expect(denied.body.error.message).toContain("model-versions:write");
    const body = testModelVersionBody();
    const bad = await analyst.post("/api/model-versions").send({
      ...body,
      name: "",
      model: { ...body.model, climate: { ...body.model.climate, ecs: { type: "normal", mean: 3, sd: -1 } } },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path)).toEqual(expect.arrayContaining(["name", "model.climate.ecs.sd"]));
    expect((await analyst.get("/api/model-versions?status=nonsense")).status).toBe(400);
    expect((await analyst.get("/api/model-versions/nope")).status).toBe(404);
  });

  it("lets only the author edit a draft", async () => {
    const edited = await analyst.patch(`/api/model-versions/${id}`).send({ notes: "ECS from AR6" });
    expect(edited.status).toBe(200);
    expect(edited.body.notes).toBe("ECS from AR6");
    // A draft written by someone else (seeded directly) is not the analyst's to edit.
    const other = await createModelVersion(t.ctx, await asUser("manager"), testModelVersionBody({ name: "Manager's own" }));
    const res = await analyst.patch(`/api/model-versions/${other.id}`).send({ notes: "x" });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("not_author");
  });

  it("submits with a change class, mails every manager and audits it", async () => {
    expect((await analyst.post(`/api/model-versions/${id}/submit`).send({ changeClass: "huge" })).status).toBe(400);
    const res = await analyst.post(`/api/model-versions/${id}/submit`).send({ changeClass: "major", note: "first cut" });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: "in-review", changeClass: "major" });
    expect(await outboxTo(demoUser("manager").email)).not.toHaveLength(0);
    expect(await outboxTo(demoUser("manager2").email)).not.toHaveLength(0);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "model-version.submitted", entityId: id } })).toBe(1);
    expect((await analyst.patch(`/api/model-versions/${id}`).send({ notes: "late" })).status).toBe(409);
  });

  it("refuses a manager deciding their own version (403 self_approval_forbidden)", async () => {
    const own = await createModelVersion(t.ctx, await asUser("manager"), testModelVersionBody({ name: "Self" }));
    await submitModelVersion(t.ctx, await asUser("manager"), own.id, "minor");
    const res = await manager.post(`/api/model-versions/${own.id}/approve`).send({ comment: "looks fine to me" });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("self_approval_forbidden");
    expect((await t.ctx.models.ModelVersion.findByPk(own.id))?.status).toBe("in-review");
  });

  it("approves by another manager with a comment, mails the author; approved is immutable", async () => {
    expect((await actuary.post(`/api/model-versions/${id}/approve`).send({ comment: "ok" })).status).toBe(403);
    expect((await manager.post(`/api/model-versions/${id}/approve`).send({})).status).toBe(400);
    const res = await manager.post(`/api/model-versions/${id}/approve`).send({ comment: "Ranges match AR6." });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: "approved", decidedBy: t.userIds.manager, decisionComment: "Ranges match AR6." });
    expect(await outboxTo(demoUser("analyst").email)).not.toHaveLength(0);
    const edit = await analyst.patch(`/api/model-versions/${id}`).send({ notes: "sneaky" });
    expect(edit.status).toBe(409);
    expect(edit.body.error.code).toBe("model_version_immutable");
    expect((await manager2.post(`/api/model-versions/${id}/reject`).send({ comment: "too late" })).status).toBe(409);
    // The database refuses too, whatever the code path.
    const raw = await t.ctx.sequelize.query(`UPDATE model_versions SET notes = 'raw' WHERE id = '${id}'`).catch((e: unknown) => e as { parent?: Error });
    expect((raw as { parent?: Error }).parent?.message).toMatch(/immutable/);
  });

  it("diffs a child against its parent (path, before, after)", async () => {
    const body = testModelVersionBody();
    const child = await analyst.post("/api/model-versions").send({
      ...body,
      parentId: id,
      model: { ...body.model, climate: { ...body.model.climate, ecs: { ...body.model.climate.ecs, high: 5.5 } } },
      notes: "ECS from AR6",
    });
    expect(child.status).toBe(201);
    expect(child.body.versionNumber).toBe(2);
    const diff = await actuary.get(`/api/model-versions/${child.body.id}/diff`);
    expect(diff.status).toBe(200);
    expect(diff.body.against).toMatchObject({ id, versionNumber: 1 });
    expect(diff.body.changes).toEqual([{ path: "model.climate.ecs.high", before: 5, after: 5.5 }]);
    const back = await actuary.get(`/api/model-versions/${id}/diff?against=${child.body.id}`);
    expect(back.body.changes).toEqual([{ path: "model.climate.ecs.high", before: 5.5, after: 5 }]);
    expect((await actuary.get(`/api/model-versions/${id}/diff?against=missing`)).status).toBe(404);
  });

  it("rejects (author mailed) and retires an approved version; retired is final", async () => {
    const draft = await analyst.post("/api/model-versions").send(testModelVersionBody({ name: "To reject" }));
    await analyst.post(`/api/model-versions/${draft.body.id}/submit`).send({ changeClass: "minor" });
    const rejected = await manager2.post(`/api/model-versions/${draft.body.id}/reject`).send({ comment: "Cite the ocean parameters." });
    expect(rejected.body).toMatchObject({ status: "rejected", decisionComment: "Cite the ocean parameters." });

    const retired = await manager2.post(`/api/model-versions/${id}/retire`).send({ comment: "superseded" });
    expect(retired.status).toBe(200);
    expect(retired.body.status).toBe("retired");
    expect((await manager2.post(`/api/model-versions/${id}/retire`).send({})).status).toBe(409);
    const actions = (await t.ctx.models.AuditEvent.findAll({ where: { entityId: id } })).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["model-version.created", "model-version.updated", "model-version.submitted", "model-version.approved", "model-version.retired"]));
  });
});
