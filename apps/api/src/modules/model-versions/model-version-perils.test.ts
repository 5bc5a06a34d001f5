import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testModelVersionBody, testPathwayBody, testRainfallProfileBody } from "../runs/runs.fixtures.js";
import { createMigrator } from "../../db/migrate.js";
import { requestUserOf } from "../../test-support/request-user.js";
import { createModelVersion, decideModelVersion, submitModelVersion } from "./model-versions.service.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let pathwayId: string;
let profileId: string;

beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary")]);
  pathwayId = (await analyst.post("/api/pathways").send(testPathwayBody())).body.id;
  profileId = (await actuary.post("/api/peril-profiles").send(testRainfallProfileBody)).body.id;
});
afterAll(async () => t.close());

describe("peril profiles pinned by a model version", () => {
  let versionId: string;

  it("refuses unknown or repeated profile ids with 400 naming each", async () => {
    const res = await analyst.post("/api/model-versions").send(testModelVersionBody({ perilProfileIds: [profileId, "ghost", profileId] }));
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([
      { path: "perilProfileIds[1]", message: "peril profile ghost does not exist" },
      { path: "perilProfileIds[2]", message: `repeats peril profile ${profileId} (already perilProfileIds[0])` },
    ]);
    const draft = (await analyst.post("/api/model-versions").send(testModelVersionBody())).body.id;
    const patch = await analyst.patch(`/api/model-versions/${draft}`).send({ perilProfileIds: ["ghost"] });
    expect(patch.status).toBe(400);
    expect(patch.body.error.details[0]).toMatchObject({ path: "perilProfileIds[0]" });
  });

  it("pins existing profiles, shows them on the version and in the diff against its parent", async () => {
    const parent = (await analyst.post("/api/model-versions").send(testModelVersionBody())).body.id;
    const res = await analyst.post("/api/model-versions").send(testModelVersionBody({ parentId: parent, perilProfileIds: [profileId] }));
    expect(res.status).toBe(201);
    versionId = res.body.id;
    expect((await actuary.get(`/api/model-versions/${versionId}`)).body.perilProfileIds).toEqual([profileId]);
    const diff = await actuary.get(`/api/model-versions/${versionId}/diff`);
    expect(diff.body.changes).toContainEqual({ path: "perilProfileIds", before: [], after: [profileId] });
  });

  it("gives a run that names no profiles the version's pinned ones; an explicit [] opts out", async () => {
    const base = { modelVersionId: versionId, pathwayIds: [pathwayId], members: 20, seed: "pinned", sampling: "monte-carlo" };
    const inherited = await actuary.post("/api/runs").send(base);
    expect(inherited.status).toBe(201);
    expect(inherited.body.perilProfileIds).toEqual([profileId]);
    const spec = (await actuary.get(`/api/runs/${inherited.body.id}`)).body.manifest.spec;
    expect(spec.perils).toEqual([{ id: profileId, ...testRainfallProfileBody }]);

    const optedOut = await actuary.post("/api/runs").send({ ...base, perilProfileIds: [] });
    expect(optedOut.status).toBe(201);
    expect(optedOut.body.perilProfileIds).toEqual([]);
    expect((await actuary.get(`/api/runs/${optedOut.body.id}`)).body.manifest.spec.perils).toBeUndefined();
  });
});

describe("the database refuses re-pinning the peril profiles of an approved version", () => {
  // Checks the database itself (raw SQL, no service in the way) against the governance rule in
  // product (README: "only approved assumptions feed filings"): only approved versions may feed filings, so what was
  // approved - pinned peril profiles included - must stay what was approved (migration 0052).
  const rawRepin = (id: string, ids: string[]) =>
    t.ctx.sequelize
      .query("UPDATE model_versions SET peril_profile_ids = :ids WHERE id = :id", { replacements: { id, ids: JSON.stringify(ids) } })
      .then(() => null)
      .catch((e: unknown) => (e as Error & { parent?: Error }).parent?.message ?? (e as Error).message);
  const storedPins = async (id: string) => (await t.ctx.models.ModelVersion.findByPk(id))?.perilProfileIds;

  let approvedId: string;
  beforeAll(async () => {
    const analystUser = await requestUserOf(t, "analyst");
    const version = await createModelVersion(t.ctx, analystUser, testModelVersionBody({ name: "Pinned and approved", perilProfileIds: [profileId] }));
    await submitModelVersion(t.ctx, analystUser, version.id, "minor");
    await decideModelVersion(t.ctx, await requestUserOf(t, "manager"), version.id, "approved", "Profiles reviewed.");
    approvedId = version.id;
  });

  it("aborts a raw UPDATE of peril_profile_ids on an approved version and keeps the pinned ids", async () => {
    expect(await rawRepin(approvedId, [])).toMatch(/approved and retired model versions are immutable/);
    expect(await storedPins(approvedId)).toEqual([profileId]);
  });

  it("still lets a draft's pins change (the trigger looks at the status, not the column alone)", async () => {
    const draft = await createModelVersion(t.ctx, await requestUserOf(t, "analyst"), testModelVersionBody({ perilProfileIds: [profileId] }));
    expect(await rawRepin(draft.id, [])).toBeNull();
    expect(await storedPins(draft.id)).toEqual([]);
  });

  it("is reversible: down restores 0011's trigger (pins editable, notes still frozen), up refuses again", async () => {
    const migrator = createMigrator(t.ctx.sequelize);
    await migrator.down({ to: "0052-model-versions-frozen-perils" });
    try {
      const notes = await t.ctx.sequelize.query("UPDATE model_versions SET notes = 'raw' WHERE id = :id", { replacements: { id: approvedId } }).catch((e: unknown) => (e as { parent?: Error }).parent?.message);
      expect(notes).toMatch(/immutable/);
      expect(await rawRepin(approvedId, [profileId, profileId])).toBeNull();
    } finally {
      await migrator.up();
    }
    expect(await rawRepin(approvedId, [profileId])).toMatch(/immutable/);
  });
});
