import { MAX_HORIZONS, MAX_MEMBERS, MAX_PATHWAY_YEARS, MAX_PATHWAYS_PER_RUN, MAX_THRESHOLDS, RUN_STATEMENT_MAX_LENGTH } from "@plumeline/contracts";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { requestUserOf } from "../../test-support/request-user.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { createModelVersion } from "../model-versions/model-versions.service.js";
import { createPathway } from "../pathways/pathways.service.js";
import { testModelVersionBody, testPathwayBody } from "./runs.fixtures.js";

// Resource limits, each refused with a message that names the limit (a run with 17,000
// thresholds was once accepted and held the database for minutes). No workers run in this
// file, so queued runs stay queued.

const QUEUED_RUN_LIMIT = 3;
let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let versionId: string;
let pathwayId: string;
const runBody = (overrides: Record<string, unknown> = {}) => ({ modelVersionId: versionId, pathwayIds: [pathwayId], members: 100, seed: "limits", sampling: "monte-carlo", ...overrides });
const details = (res: { body: { error: { details?: Array<{ path: string; message: string }> } } }) => res.body.error.details ?? [];

beforeAll(async () => {
  t = await createTestContext({ RUNS_QUEUED_PER_PERSON: String(QUEUED_RUN_LIMIT) });
  [analyst, actuary] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary")]);
  const a = await requestUserOf(t, "analyst");
  pathwayId = (await createPathway(t.ctx, a, testPathwayBody("Limits ramp"))).id;
  versionId = (await createModelVersion(t.ctx, a, testModelVersionBody({ name: "Limits" }))).id;
});
afterAll(async () => t.close());

describe("run request limits", () => {
  it("refuses 17,000 thresholds with a 400 naming the field and the limit", async () => {
    const res = await analyst.post("/api/runs").send(runBody({ thresholds: Array.from({ length: 17_000 }, (_, i) => i / 1000) }));
    expect(res.status).toBe(400);
    expect(details(res)).toEqual([{ path: "thresholds", message: `must list at most ${MAX_THRESHOLDS} values (the limit per run)` }]);
  });

  it("refuses repeated horizons and more horizons than the limit", async () => {
    const repeated = await analyst.post("/api/runs").send(runBody({ horizons: [2050, 2100, 2050] }));
    expect(repeated.status).toBe(400);
    expect(details(repeated)).toEqual([{ path: "horizons[2]", message: "repeats 2050 (already horizons[0])" }]);
    const many = await analyst.post("/api/runs").send(runBody({ horizons: Array.from({ length: 10_040 }, () => 2100) }));
    expect(many.status).toBe(400);
    expect(details(many)[0]).toEqual({ path: "horizons", message: `must list at most ${MAX_HORIZONS} values (the limit per run)` });
  });

  it("refuses members and pathways beyond their limits, naming them", async () => {
    const members = await analyst.post("/api/runs").send(runBody({ members: MAX_MEMBERS + 1 }));
    expect(details(members)).toEqual([{ path: "members", message: `must be at most ${MAX_MEMBERS}` }]);
    const pathways = await analyst.post("/api/runs").send(runBody({ pathwayIds: Array.from({ length: MAX_PATHWAYS_PER_RUN + 1 }, (_, i) => `p${i}`) }));
    expect(details(pathways)).toEqual([{ path: "pathwayIds", message: `must hold at most ${MAX_PATHWAYS_PER_RUN} pathways (the limit per run)` }]);
  });

  it("refuses a pathway longer than the pathway length limit", async () => {
    const body = testPathwayBody("Too long");
    const res = await analyst.post("/api/pathways").send({ ...body, startYear: 1001, agents: { co2: { erf: Array(MAX_PATHWAY_YEARS + 1).fill(1) } } });
    expect(res.status).toBe(400);
    expect(details(res)).toEqual([{ path: "agents.co2.erf", message: `must hold at most ${MAX_PATHWAY_YEARS} values (the pathway length limit, in years)` }]);
  });

  it("refuses a statement longer than its limit", async () => {
    const run = await analyst.post("/api/runs").send(runBody());
    expect(run.status).toBe(201);
    const res = await analyst.post(`/api/runs/${run.body.id}/statements`).send({ kind: "limitation", text: "x".repeat(RUN_STATEMENT_MAX_LENGTH + 1) });
    expect(res.status).toBe(400);
    expect(details(res)).toEqual([{ path: "text", message: `at most ${RUN_STATEMENT_MAX_LENGTH} characters` }]);
  });

  it("refuses a run beyond the runs one person may have queued, naming the limit; others still queue", async () => {
    const mine = await t.ctx.models.Run.count({ where: { createdBy: t.userIds.analyst, status: "queued" } });
    for (let i = mine; i < QUEUED_RUN_LIMIT; i++) expect((await analyst.post("/api/runs").send(runBody())).status).toBe(201);
    const refused = await analyst.post("/api/runs").send(runBody());
    expect(refused.status).toBe(429);
    expect(refused.body.error.code).toBe("run_queue_limit");
    expect(refused.body.error.message).toContain(`${QUEUED_RUN_LIMIT} runs queued or running`);
    expect(await t.ctx.models.Run.count({ where: { createdBy: t.userIds.analyst } })).toBe(QUEUED_RUN_LIMIT);
    expect((await actuary.post("/api/runs").send(runBody())).status).toBe(201);
  });
});
