import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
let manager: SignedInAgent;

beforeAll(async () => {
  t = await createTestContext();
  [analyst, actuary, manager] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "actuary"), signIn(t.app, "manager")]);
});
afterAll(async () => {
  await t.close();
});

/** Heavy-rainfall style profile: 7 %/K with a 5–95 % range of 5–9 %/K (split-normal). */
const rainfall = {
  name: "Heavy rainfall, test region",
  peril: "flood-heavy-rainfall",
  region: "Test Vale",
  metric: "severity",
  baselineWarming: 1.1,
  scaling: { kind: "per-kelvin", rate: { type: "range", p50: 0.07, low: 0.05, high: 0.09, coverage: 90, shape: "split-normal" } },
  source: "test",
} as const;

/** IPCC AR6 WGI SPM Figure SPM.6: 10-year hot extreme frequencies at 1 / 1.5 / 2 / 4 °C (read in reproductions of the figure), saved the old way (no return period). */
const spm6Table = {
  kind: "table",
  points: [
    { warming: 0, multiplier: 1 },
    { warming: 1, multiplier: 2.8 },
    { warming: 1.5, multiplier: 4.1 },
    { warming: 2, multiplier: 5.6 },
    { warming: 4, multiplier: 9.4 },
  ],
  beyondTable: "hold",
} as const;

const fixedClimate = Object.fromEntries(
  ["ecs", "f2x", "upperHeatCapacity", "deepHeatCapacity", "heatExchange", "deepEfficacy"].map((k) => [k, { type: "fixed", value: 1 }]),
);

async function createProfile(agent: SignedInAgent, body: object = rainfall) {
  const res = await agent.post("/api/peril-profiles").send(body);
  expect(res.status).toBe(201);
  return res.body as { id: string; locked: boolean; createdBy: string };
}

describe("peril profiles CRUD", () => {
  it("creates a profile owned by its author, lists and reads it, and audits the creation", async () => {
    const created = await createProfile(analyst);
    expect(created).toMatchObject({ ...rainfall, locked: false, createdBy: t.userIds.analyst, copiedFrom: null });
    const list = await actuary.get("/api/peril-profiles");
    expect(list.status).toBe(200);
    expect(list.body.items.map((p: { id: string }) => p.id)).toContain(created.id);
    const one = await manager.get(`/api/peril-profiles/${created.id}`);
    expect(one.status).toBe(200);
    expect(one.body.scaling).toEqual(rainfall.scaling);
    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "peril-profile.created", entityId: created.id } });
    expect(audit?.actorId).toBe(t.userIds.analyst);
  });

  it("answers 401 without a session", async () => {
    expect((await request(t.app).get("/api/peril-profiles")).status).toBe(401);
    expect((await request(t.app).post("/api/peril-profiles/preview").send({ profile: rainfall })).status).toBe(401);
  });

  it("answers 403 naming perils:write for a manager", async () => {
    const res = await manager.post("/api/peril-profiles").send(rainfall);
    expect(res.status).toBe(403);
    expect(res.body.error.message).toContain("perils:write");
  });

  it("answers 400 naming every bad field (baseline outside 0–3 K, rate reaching −100 %, table not increasing)", async () => {
    const before = await t.ctx.models.PerilProfile.count();
    const res = await analyst.post("/api/peril-profiles").send({ ...rainfall, baselineWarming: 3.5, scaling: { kind: "per-kelvin", rate: { type: "uniform", min: -1.2, max: 0.1 } } });
    expect(res.status).toBe(400);
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(["baselineWarming", "scaling.rate.min"]));
    const table = await analyst.post("/api/peril-profiles").send({
      ...rainfall,
      scaling: { kind: "table", points: [{ warming: 1, multiplier: 1 }, { warming: 1, multiplier: 2 }], beyondTable: "hold" },
    });
    expect(table.status).toBe(400);
    expect(table.body.error.details[0].path).toBe("scaling.points[1].warming");
    expect(await t.ctx.models.PerilProfile.count()).toBe(before);
  });

  it("answers 404 for an unknown id on read, curve, edit, delete and copy", async () => {
    expect((await analyst.get("/api/peril-profiles/nope")).status).toBe(404);
    expect((await analyst.get("/api/peril-profiles/nope/curve")).status).toBe(404);
    expect((await analyst.patch("/api/peril-profiles/nope").send({ name: "x" })).status).toBe(404);
    expect((await analyst.delete("/api/peril-profiles/nope")).status).toBe(404);
    expect((await analyst.post("/api/peril-profiles/nope/copy").send({})).status).toBe(404);
  });

  it("lets only the creator edit (403 not_owner for another writer), validates the merged profile, audits before/after", async () => {
    const p = await createProfile(analyst);
    const other = await actuary.patch(`/api/peril-profiles/${p.id}`).send({ name: "Taken over" });
    expect(other.status).toBe(403);
    expect(other.body.error.code).toBe("not_owner");
    const bad = await analyst.patch(`/api/peril-profiles/${p.id}`).send({ baselineWarming: -0.5 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe("baselineWarming");
    const ok = await analyst.patch(`/api/peril-profiles/${p.id}`).send({ name: "Renamed", baselineWarming: 1.2 });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ name: "Renamed", baselineWarming: 1.2, scaling: rainfall.scaling });
    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "peril-profile.updated", entityId: p.id } });
    expect((audit?.data as { before: { name: string } }).before.name).toBe(rainfall.name);
  });

  it("deletes the creator's unlocked profile (204, then 404) and refuses while a draft model version names it", async () => {
    const p = await createProfile(actuary);
    const version = await analyst.post("/api/model-versions").send({ name: "Draft naming a profile", model: { climate: fixedClimate }, perilProfileIds: [p.id] });
    expect(version.status).toBe(201);
    const blocked = await actuary.delete(`/api/peril-profiles/${p.id}`);
    expect(blocked.status).toBe(409);
    expect(blocked.body.error.code).toBe("peril_profile_in_use");
    expect((await analyst.patch(`/api/model-versions/${version.body.id}`).send({ perilProfileIds: [] })).status).toBe(200);
    expect((await analyst.delete(`/api/peril-profiles/${p.id}`)).status).toBe(403);
    expect((await actuary.delete(`/api/peril-profiles/${p.id}`)).status).toBe(204);
    expect((await actuary.get(`/api/peril-profiles/${p.id}`)).status).toBe(404);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "peril-profile.deleted", entityId: p.id } })).toBe(1);
  });
});

describe("locked profiles", () => {
  it("locks a profile an approved model version pins (409 on edit and delete) and lets anyone with perils:write copy it", async () => {
    const p = await createProfile(analyst);
    const version = await analyst.post("/api/model-versions").send({ name: "Pins a profile", model: { climate: fixedClimate }, perilProfileIds: [p.id] });
    expect(version.status).toBe(201);
    // Still a draft: the profile can change.
    expect((await analyst.patch(`/api/peril-profiles/${p.id}`).send({ source: "draft stage" })).status).toBe(200);
    expect((await analyst.post(`/api/model-versions/${version.body.id}/submit`).send({ changeClass: "minor" })).status).toBe(200);
    expect((await manager.post(`/api/model-versions/${version.body.id}/approve`).send({ comment: "ok" })).status).toBe(200);

    const read = await analyst.get(`/api/peril-profiles/${p.id}`);
    expect(read.body.locked).toBe(true);
    expect(read.body.lockedBy.modelVersions).toEqual([expect.objectContaining({ id: version.body.id, status: "approved" })]);
    const edit = await analyst.patch(`/api/peril-profiles/${p.id}`).send({ name: "Changed after approval" });
    expect(edit.status).toBe(409);
    expect(edit.body.error.code).toBe("peril_profile_locked");
    expect(edit.body.error.message).toMatch(/copy it instead/i);
    expect((await analyst.delete(`/api/peril-profiles/${p.id}`)).status).toBe(409);
    expect((await analyst.get(`/api/peril-profiles/${p.id}`)).body.name).toBe(rainfall.name);

    const copy = await actuary.post(`/api/peril-profiles/${p.id}/copy`).send({});
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: `${rainfall.name} (copy)`, locked: false, copiedFrom: p.id, createdBy: t.userIds.actuary, scaling: rainfall.scaling });
    expect((await actuary.patch(`/api/peril-profiles/${copy.body.id}`).send({ name: "Mine now" })).status).toBe(200);
    expect((await manager.post(`/api/peril-profiles/${p.id}/copy`).send({})).status).toBe(403);
  });
});

describe("preview curves", () => {
  it("GET /:id/curve: the 5th and 95th percentiles one kelvin past the baseline are 1 + the range's own low and high", async () => {
    // A "range" distribution is defined by its percentiles: 5 % -> low, 95 % -> high (coverage 90).
    const p = await createProfile(analyst);
    const res = await analyst.get(`/api/peril-profiles/${p.id}/curve`).query({ from: 0.1, to: 3.1, step: 1 });
    expect(res.status).toBe(200);
    expect(res.body.warming).toEqual([0.1, 1.1, 2.1, 3.1]);
    expect(res.body.bands.p5[2]).toBeCloseTo(1.05, 12);
    expect(res.body.bands.p95[2]).toBeCloseTo(1.09, 12);
    expect(res.body.bands.p50[3]).toBeCloseTo(1.07 ** 2, 12); // (1 + r)^(ΔT − ΔT0), closed form
    expect(res.body.bands.p50[1]).toBe(1); // exactly 1 at the baseline warming
    // Below the baseline the ordering flips: the 5th percentile uses the high rate, 1 / 1.09.
    expect(res.body.bands.p5[0]).toBeCloseTo(1 / 1.09, 12);
    expect(res.body).toMatchObject({ baselineWarming: 1.1, metric: "severity", percentiles: [5, 17, 50, 83, 95] });
  });

  it("GET /:id/curve answers 400 for a bad range", async () => {
    const p = await createProfile(analyst);
    const res = await analyst.get(`/api/peril-profiles/${p.id}/curve`).query({ from: 2, to: 1, step: 0 });
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string }) => d.path)).toEqual(expect.arrayContaining(["to", "step"]));
  });

  it("POST /preview of an unsaved table profile reproduces the SPM.6 points divided by the value at the baseline", async () => {
    const draft = { ...rainfall, metric: "frequency", baselineWarming: 1, scaling: spm6Table };
    const res = await actuary.post("/api/peril-profiles/preview").send({ profile: draft, range: { from: 0, to: 4, step: 0.5 } });
    expect(res.status).toBe(200);
    const at = (w: number) => res.body.bands.p50[res.body.warming.indexOf(w)];
    // SPM.6: 2.8 at 1 °C, 5.6 at 2 °C, 9.4 at 4 °C -> relative to 1 °C: 1, 2, 9.4 / 2.8.
    expect(at(1)).toBeCloseTo(1, 12);
    expect(at(2)).toBeCloseTo(2, 12);
    expect(at(4)).toBeCloseTo(9.4 / 2.8, 12);
    expect(at(3)).toBeCloseTo((5.6 + 9.4) / 2 / 2.8, 12); // straight line between the 2 and 4 °C points
    expect(res.body.bands.p5).toEqual(res.body.bands.p95); // a table carries no scaling uncertainty
    expect(await t.ctx.models.PerilProfile.count({ where: { name: rainfall.name, metric: "frequency" } })).toBe(0);
  });

  it("POST /preview of tables for two return periods gives each table's curve by its return period", async () => {
    // IPCC AR6 WGI SPM Figure SPM.6: 50-year hot extremes 4.8 / 8.6 / 13.9 / 39.2 times per 50 years at 1 / 1.5 / 2 / 4 °C.
    const fifty = [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 4.8 }, { warming: 1.5, multiplier: 8.6 }, { warming: 2, multiplier: 13.9 }, { warming: 4, multiplier: 39.2 }];
    const scaling = { kind: "table", tables: [{ returnPeriod: 10, points: spm6Table.points }, { returnPeriod: 50, points: fifty }], beyondTable: "hold", beyondReturnPeriods: "hold" };
    const res = await actuary.post("/api/peril-profiles/preview").send({ profile: { ...rainfall, metric: "frequency", baselineWarming: 0, scaling }, range: { from: 0, to: 4, step: 1 } });
    expect(res.status).toBe(200);
    expect(res.body.tables.map((t: { returnPeriod: number }) => t.returnPeriod)).toEqual([10, 50]);
    expect(res.body.tables[1].multiplier[4]).toBe(39.2);
    expect(res.body.tables[0].multiplier[2]).toBe(5.6);
    expect(res.body.bands.p50).toEqual(res.body.tables[0].multiplier);
  });

  it("reads a profile stored before tables stated a return period as one 10-year table and previews it", async () => {
    const created = await createProfile(analyst, { ...rainfall, peril: "heat", metric: "frequency", baselineWarming: 1, scaling: spm6Table });
    // Store the old shape directly, as a database from before the change holds it.
    await t.ctx.models.PerilProfile.update({ scaling: spm6Table }, { where: { id: created.id } });
    const read = await actuary.get(`/api/peril-profiles/${created.id}`);
    expect(read.body.scaling).toEqual({ kind: "table", tables: [{ returnPeriod: 10, points: spm6Table.points }], beyondTable: "hold", beyondReturnPeriods: "hold" });
    const curve = await actuary.get(`/api/peril-profiles/${created.id}/curve?from=1&to=2&step=1`);
    expect(curve.body.bands.p50).toEqual([1, 2]);
  });

  it("POST /preview answers 400 naming the draft's field", async () => {
    const res = await actuary.post("/api/peril-profiles/preview").send({ profile: { ...rainfall, metric: "both" } });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe("profile.metric");
  });
});
