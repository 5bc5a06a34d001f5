import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testModelVersionBody, testPathwayBody, testRainfallProfileBody } from "../runs/runs.fixtures.js";

// What is under review must not change: a manager approves numbers, and the diff shows only
// the ids of pinned pathways and peril profiles. Pinned inputs lock at submission; a rejected
// version unlocks those that nothing else locks.

let t: TestContext;
let analyst: SignedInAgent;
let manager: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  [analyst, manager] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "manager")]);
});
afterAll(async () => t.close());

async function pathway(name: string): Promise<string> {
  const res = await analyst.post("/api/pathways").send(testPathwayBody(name));
  expect(res.status).toBe(201);
  return res.body.id;
}
async function profile(name: string): Promise<string> {
  const res = await analyst.post("/api/peril-profiles").send({ ...testRainfallProfileBody, name });
  expect(res.status).toBe(201);
  return res.body.id;
}
async function submittedVersion(name: string, pathwayIds: string[], perilProfileIds: string[]): Promise<string> {
  const created = await analyst.post("/api/model-versions").send(testModelVersionBody({ name, pathwayIds, perilProfileIds }));
  expect(created.status).toBe(201);
  expect((await analyst.post(`/api/model-versions/${created.body.id}/submit`).send({ changeClass: "minor" })).status).toBe(200);
  return created.body.id;
}
const editPathway = (id: string) => analyst.patch(`/api/pathways/${id}`).send({ description: `edited ${Date.now()}` });
const editProfile = (id: string) => analyst.patch(`/api/peril-profiles/${id}`).send({ ...testRainfallProfileBody, name: `edited ${Date.now()}` });

describe("pinned inputs lock at submission", () => {
  it("refuses edits to a pathway and a peril profile once a version pinning them is submitted", async () => {
    const [p, q] = [await pathway("Under review"), await profile("Under review")];
    await submittedVersion("Review me", [p], [q]);
    const pathwayEdit = await editPathway(p);
    expect(pathwayEdit.status).toBe(409);
    expect(pathwayEdit.body.error.code).toBe("pathway_locked");
    const profileEdit = await editProfile(q);
    expect(profileEdit.status).toBe(409);
    expect(profileEdit.body.error.code).toBe("peril_profile_locked");
  });

  it("unlocks them again when the version is rejected and nothing else locks them", async () => {
    const [p, q] = [await pathway("Rejected pin"), await profile("Rejected pin")];
    const id = await submittedVersion("Will be rejected", [p], [q]);
    expect((await manager.post(`/api/model-versions/${id}/reject`).send({ comment: "not yet" })).status).toBe(200);
    expect((await editPathway(p)).status).toBe(200);
    expect((await editProfile(q)).status).toBe(200);
  });

  it("keeps them locked after a rejection when another submitted or approved version still pins them", async () => {
    const [p, q] = [await pathway("Shared pin"), await profile("Shared pin")];
    const approved = await submittedVersion("Approved holder", [p], [q]);
    expect((await manager.post(`/api/model-versions/${approved}/approve`).send({ comment: "fine" })).status).toBe(200);
    const rejected = await submittedVersion("Rejected sharer", [p], [q]);
    expect((await manager.post(`/api/model-versions/${rejected}/reject`).send({ comment: "no" })).status).toBe(200);
    expect((await editPathway(p)).status).toBe(409);
    expect((await editProfile(q)).status).toBe(409);
    const [p2] = [await pathway("Pinned twice in review")];
    await submittedVersion("First in review", [p2], []);
    const second = await submittedVersion("Second in review", [p2], []);
    expect((await manager.post(`/api/model-versions/${second}/reject`).send({ comment: "no" })).status).toBe(200);
    expect((await editPathway(p2)).status).toBe(409);
  });
});

describe("model versions are checked by the engine when a draft is saved", () => {
  it("refuses a fixed ECS of -3 K at save, naming the field", async () => {
    const body = testModelVersionBody({ name: "Negative ECS" });
    const model = { ...body.model, climate: { ...body.model.climate, ecs: { type: "fixed", value: -3 } } };
    const res = await analyst.post("/api/model-versions").send({ ...body, model });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([{ path: "model.climate.ecs.value", message: "must be > 0 (a physical input)" }]);
    const draft = await analyst.post("/api/model-versions").send(body);
    const edit = await analyst.patch(`/api/model-versions/${draft.body.id}`).send({ model });
    expect(edit.status).toBe(400);
    expect(edit.body.error.details[0].path).toBe("model.climate.ecs.value");
  });
});
