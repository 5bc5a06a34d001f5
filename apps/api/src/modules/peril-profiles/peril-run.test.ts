import { demoPortfolioCsv } from "@plumeline/seeds";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testModelVersionBody, testPathwayBody } from "../runs/runs.fixtures.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let pathwayId: string;
let versionId: string;
let portfolioId: string;

const flood = {
  name: "Heavy rainfall, Northmere",
  peril: "flood-heavy-rainfall",
  region: "Northmere Coast",
  metric: "severity",
  baselineWarming: 1.1,
  scaling: { kind: "per-kelvin", rate: { type: "fixed", value: 0.07 } },
} as const;

beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary")]);
  pathwayId = (await analyst.post("/api/pathways").send(testPathwayBody())).body.id;
  versionId = (await analyst.post("/api/model-versions").send(testModelVersionBody())).body.id;
  portfolioId = (
    await actuary.post("/api/portfolios/upload").field("name", "Baseline").attach("file", Buffer.from(demoPortfolioCsv()), "demo.csv")
  ).body.id;
});
afterAll(async () => {
  await t.close();
});

const runBody = (extra: object) => ({ modelVersionId: versionId, pathwayIds: [pathwayId], members: 20, seed: "peril", sampling: "monte-carlo", ...extra });

describe("runs with the peril lens", () => {
  it("copies the profiles and the portfolio rows into the stored spec and locks the profiles", async () => {
    const profile = (await actuary.post("/api/peril-profiles").send(flood)).body;
    const res = await actuary.post("/api/runs").send(runBody({ perilProfileIds: [profile.id], portfolioId }));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ perilProfileIds: [profile.id], portfolioId });
    const run = await actuary.get(`/api/runs/${res.body.id}`);
    const spec = run.body.manifest.spec;
    expect(spec.perils).toEqual([{ id: profile.id, ...flood }]);
    expect(spec.portfolio.id).toBe(portfolioId);
    expect(spec.portfolio.rows).toEqual((await actuary.get(`/api/portfolios/${portfolioId}`)).body.rows);

    const after = (await actuary.get(`/api/peril-profiles/${profile.id}`)).body;
    expect(after.locked).toBe(true);
    expect(after.lockedBy.runIds).toEqual([res.body.id]);
    const edit = await actuary.patch(`/api/peril-profiles/${profile.id}`).send({ baselineWarming: 1.2 });
    expect(edit.status).toBe(409);
    expect(edit.body.error.code).toBe("peril_profile_locked");
  });

  it("leaves the spec without perils when the run names none", async () => {
    const res = await actuary.post("/api/runs").send(runBody({}));
    expect(res.status).toBe(201);
    const spec = (await actuary.get(`/api/runs/${res.body.id}`)).body.manifest.spec;
    expect(spec.perils).toBeUndefined();
    expect(spec.portfolio).toBeUndefined();
  });

  it("answers 400 naming unknown and repeated profile ids, an unknown portfolio, and a portfolio without profiles; queues nothing", async () => {
    const profile = (await actuary.post("/api/peril-profiles").send(flood)).body;
    const before = await t.ctx.models.Run.count();
    const bad = await actuary.post("/api/runs").send(runBody({ perilProfileIds: [profile.id, "missing", profile.id], portfolioId: "nope" }));
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(["perilProfileIds[1]", "perilProfileIds[2]", "portfolioId"]);
    const alone = await actuary.post("/api/runs").send(runBody({ portfolioId }));
    expect(alone.status).toBe(400);
    expect(alone.body.error.details).toEqual([{ path: "portfolioId", message: expect.stringContaining("at least one peril profile") }]);
    expect(await t.ctx.models.Run.count()).toBe(before);
    expect((await actuary.get(`/api/peril-profiles/${profile.id}`)).body.locked).toBe(false);
  });
});
