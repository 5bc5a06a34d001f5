import { runEnsemble } from "@plumeline/engine";
import type { RunSpec } from "@plumeline/contracts";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testModelVersionBody, testPathwayBody } from "../runs/runs.fixtures.js";

let t: TestContext;
let analyst: SignedInAgent;
let manager: SignedInAgent;
let admin: SignedInAgent;
let steep: string;
let gentle: string;
let parentId: string;

const base = testModelVersionBody();
/** ECS median 3 K -> 4 K: warms every horizon by far more than 0.1 K (higher sensitivity, rising forcing). */
const hotterModel = { ...base.model, climate: { ...base.model.climate, ecs: { type: "range" as const, p50: 4, low: 2.5, high: 6.5, coverage: 90 as const, shape: "lognormal" as const } } };

async function draft(name: string, model = base.model): Promise<string> {
  const res = await analyst.post("/api/model-versions").send({ ...base, name, model, parentId, pathwayIds: [steep, gentle] });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

beforeAll(async () => {
  t = await createTestContext();
  [analyst, manager, admin] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "manager"), signIn(t.app, "admin")]);
  steep = (await analyst.post("/api/pathways").send(testPathwayBody("Steep ramp", 4))).body.id;
  gentle = (await analyst.post("/api/pathways").send(testPathwayBody("Gentle ramp", 2))).body.id;
  parentId = (await analyst.post("/api/model-versions").send({ ...base, pathwayIds: [steep, gentle] })).body.id;
});
afterAll(async () => t.close());

describe("impact preview on every pinned pathway", () => {
  it("covers each pinned pathway with the engine's own numbers, and a picked subset is its own cache entry", async () => {
    const child = await draft("Two pathways");
    const res = await manager.post(`/api/model-versions/${child}/impact`).send({ members: 300 });
    expect(res.status).toBe(200);
    expect(res.body.pathways.map((p: { pathway: { name: string } }) => p.pathway.name)).toEqual(["Steep ramp", "Gentle ramp"]);

    // Independent check: a run of the same choices on both pathways, run here by the engine, gives each pathway's numbers.
    const run = await analyst.post("/api/runs").send({ modelVersionId: child, pathwayIds: [steep, gentle], members: 300, seed: "impact-preview", sampling: "latin-hypercube" });
    const spec = (await analyst.get(`/api/runs/${run.body.id}`)).body.manifest.spec as RunSpec;
    const direct = runEnsemble(spec);
    for (const [i, id] of [steep, gentle].entries()) {
      const engine = direct.pathways.find((p) => p.id === id)!;
      expect(res.body.pathways[i].version.map((h: { temperature: unknown }) => h.temperature)).toEqual(engine.horizons.map((h) => h.temperature));
    }
    // Same model on both sides: every difference is exactly zero (same seed, same members), nothing fires.
    expect(res.body.pathways.flatMap((p: { differences: Array<{ medianShift: number }> }) => p.differences.map((d) => d.medianShift))).toEqual([0, 0, 0, 0, 0, 0]);
    expect(res.body.materiality.fired).toEqual([]);

    const picked = await manager.post(`/api/model-versions/${child}/impact`).send({ members: 300, pathwayIds: [gentle] });
    expect(picked.status).toBe(200);
    expect(picked.body.cached).toBe(false);
    expect(picked.body.pathways.map((p: { pathway: { id: string } }) => p.pathway.id)).toEqual([gentle]);
    expect(picked.body.version.inputHash).not.toBe(res.body.version.inputHash);
    expect(picked.body.pathways[0].version).toEqual(res.body.pathways[1].version);
  });

  it("names for the reviewer every threshold the preview passes, on each pathway", async () => {
    const child = await draft("Hotter preview", hotterModel);
    const res = await manager.post(`/api/model-versions/${child}/impact`).send({ members: 300 });
    const fired = res.body.materiality.fired as Array<{ pathwayId: string; year: number; metric: string; value: number; limit: number }>;
    expect(new Set(fired.map((f) => f.pathwayId))).toEqual(new Set([steep, gentle]));
    const median2100 = fired.find((f) => f.pathwayId === steep && f.year === 2100 && f.metric === "median-shift")!;
    const diff2100 = res.body.pathways[0].differences.find((d: { year: number }) => d.year === 2100);
    expect(median2100).toMatchObject({ value: diff2100.medianShift, limit: 0.1 });
    expect(res.body.materiality.policy).toEqual({ medianShiftK: 0.1, exceedancePoints: 5, widthChangePercent: 10 });
  });
});

describe("POST /api/model-versions/:id/submit under the materiality policy", () => {
  let hotter: string;

  it("refuses a minor filing whose preview passes a threshold: 409 naming materiality and each firing", async () => {
    hotter = await draft("Hotter, filed as minor", hotterModel);
    const res = await analyst.post(`/api/model-versions/${hotter}/submit`).send({ changeClass: "minor" });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("materiality_threshold_exceeded");
    expect(res.body.error.message).toContain("major");
    const details = res.body.error.details as Array<{ path: string; message: string; data: Record<string, unknown> }>;
    const steep2100 = details.find((d) => d.data.pathwayId === steep && d.data.year === 2100 && d.data.metric === "median-shift")!;
    expect(steep2100.message).toMatch(/^median shift \+\d\.\d\d K > 0\.1 K on Steep ramp 2100$/);
    expect(steep2100.data).toMatchObject({ pathwayName: "Steep ramp", limit: 0.1, unit: "K" });
    // The refusal names the same numbers the reviewer's default preview shows (same members, same seed).
    const preview = await manager.post(`/api/model-versions/${hotter}/impact`).send({});
    expect(preview.body.cached).toBe(true);
    expect(details.map((d) => d.data)).toEqual(preview.body.materiality.fired);
    // Nothing changed: still a draft, no submission audited, no pathway locked.
    expect((await analyst.get(`/api/model-versions/${hotter}`)).body.status).toBe("draft");
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "model-version.submitted", entityId: hotter } })).toBe(0);
  });

  it("files the same draft re-classed as major", async () => {
    const res = await analyst.post(`/api/model-versions/${hotter}/submit`).send({ changeClass: "major", note: "ECS median to 4 K" });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: "in-review", changeClass: "major" });
  });

  it("files a minor change that moves nothing, recording the check in the audit row", async () => {
    const notesOnly = await draft("Notes only");
    const res = await analyst.post(`/api/model-versions/${notesOnly}/submit`).send({ changeClass: "minor" });
    expect(res.status).toBe(200);
    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "model-version.submitted", entityId: notesOnly } });
    expect((audit?.data as { materiality: unknown }).materiality).toEqual({ checked: true, skipped: null, pathwayIds: [steep, gentle], members: 2000, fired: [] });
  });

  it("holds a minor filing to the policy an admin set", async () => {
    const put = await admin
      .put("/api/settings/materiality")
      .send({ medianShiftK: 5, exceedancePoints: 100, widthChangePercent: 1000, reason: "Test: loosest allowed policy" });
    expect(put.status).toBe(200);
    const again = await draft("Hotter under a loose policy", hotterModel);
    const res = await analyst.post(`/api/model-versions/${again}/submit`).send({ changeClass: "minor" });
    expect(res.status).toBe(200);
    expect(res.body.changeClass).toBe("minor");
  });
});
