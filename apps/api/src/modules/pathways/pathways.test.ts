import ExcelJS from "exceljs";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { createModelVersion, decideModelVersion, submitModelVersion } from "../model-versions/model-versions.service.js";
import { testModelVersionBody, testPathwayBody } from "../runs/runs.fixtures.js";
import { requestUserOf } from "../../test-support/request-user.js";

let t: TestContext;
let analyst: SignedInAgent;
let actuary: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  analyst = await signIn(t.app, "analyst");
  actuary = await signIn(t.app, "actuary");
});
afterAll(async () => t.close());

const user = (key: "analyst" | "manager" | "manager2") => requestUserOf(t, key);

describe("POST /api/pathways and GET /api/pathways[/:id]", () => {
  it("creates a pathway from JSON, lists it and reads it back with its series and checksum", async () => {
    const res = await analyst.post("/api/pathways").send(testPathwayBody("JSON ramp"));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: "JSON ramp", startYear: 1850, endYear: 2100, agents: { co2: { erf: expect.any(Array) } }, locked: false });
    expect(res.body.checksum).toMatch(/^[0-9a-f]{64}$/);
    const list = await actuary.get("/api/pathways");
    expect(list.status).toBe(200);
    expect(list.body.items.find((p: { id: string }) => p.id === res.body.id)).toMatchObject({ agents: ["co2", "aerosol-cloud"], quantities: { co2: "erf" } });
    const one = await actuary.get(`/api/pathways/${res.body.id}`);
    expect(one.status).toBe(200);
    expect(one.body.agents.co2.erf[250]).toBe(4);
    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "pathway.created", entityId: res.body.id } });
    expect(audit).not.toBeNull();
  });

  it("answers 401 without a session, 403 for a role without pathways:write, 404 for an unknown id", async () => {
    expect((await request(t.app).get("/api/pathways")).status).toBe(401);
    const denied = await actuary.post("/api/pathways").send(testPathwayBody());
    expect(denied.status).toBe(403);
    expect(denied.body.error.message).toContain("pathways:write");
    const missing = await analyst.get("/api/pathways/no-such-id");
    expect(missing.status).toBe(404);
  });

  it("answers 400 listing every bad field, including series of different lengths", async () => {
    const body = testPathwayBody();
    const res = await analyst.post("/api/pathways").send({ ...body, source: "", agents: { co2: { erf: [1, "x"] }, sulphate: { erf: [1] } } });
    expect(res.status).toBe(400);
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(["source", "agents.co2"]));
    const uneven = await analyst.post("/api/pathways").send({ ...body, agents: { co2: { erf: [1, 2, 3] }, ozone: { erf: [1, 2] } } });
    expect(uneven.status).toBe(400);
    expect(uneven.body.error.details).toEqual([{ path: "agents.ozone.erf", message: "has 2 values, expected 3 like co2" }]);
  });
});

describe("POST /api/pathways/upload", () => {
  const csv = "year,co2_ppm,aerosol-cloud_erf_wm2\n2000,370,-0.8\n2001,372,-0.81\n2002,374,-0.82\n";

  it("previews a CSV without saving, then creates it with the same checksum as the JSON route", async () => {
    const before = await t.ctx.models.Pathway.count();
    const preview = await analyst.post("/api/pathways/upload").field("preview", "true").attach("file", Buffer.from(csv), "gases.csv");
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ startYear: 2000, endYear: 2002, agents: [{ agent: "co2", quantity: "ppm" }, { agent: "aerosol-cloud", quantity: "erf" }] });
    expect(preview.body.rows[1]).toEqual({ year: 2001, co2_ppm: 372, "aerosol-cloud_erf_wm2": -0.81 });
    // The whole series too, as it would be stored, so the preview can chart every year.
    expect(preview.body.series).toEqual({ co2: { ppm: [370, 372, 374] }, "aerosol-cloud": { erf: [-0.8, -0.81, -0.82] } });
    expect(await t.ctx.models.Pathway.count()).toBe(before);

    const created = await analyst
      .post("/api/pathways/upload")
      .field({ name: "Uploaded gases", source: "test file", vintage: "v1" })
      .attach("file", Buffer.from(csv), "gases.csv");
    expect(created.status).toBe(201);
    const viaJson = await analyst.post("/api/pathways").send({
      name: "Same numbers",
      source: "typed in",
      vintage: "v1",
      startYear: 2000,
      agents: { co2: { ppm: [370, 372, 374] }, "aerosol-cloud": { erf: [-0.8, -0.81, -0.82] } },
    });
    // The checksum covers the numbers only (startYear + series), so both routes agree.
    expect(created.body.checksum).toBe(viaJson.body.checksum);
  });

  it("reads an XLSX upload", async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet("data");
    ws.addRows([["year", "co2_erf_wm2"], [1900, 0.5], [1901, 0.52]]);
    const res = await analyst
      .post("/api/pathways/upload")
      .field({ name: "From Excel", source: "sheet", vintage: "v1" })
      .attach("file", Buffer.from(await wb.xlsx.writeBuffer()), "forcing.xlsx");
    expect(res.status).toBe(201);
    expect(res.body.agents).toEqual({ co2: { erf: [0.5, 0.52] } });
  });

  it("names every bad cell by row and column, with missing fields, and saves nothing", async () => {
    const before = await t.ctx.models.Pathway.count();
    const bad = "year,co2_ppm,ozone_erf_wm2\n2000,370,0.1\n2001,oops,0.2\n2003,375,\n";
    const res = await analyst.post("/api/pathways/upload").field({ name: "Bad" }).attach("file", Buffer.from(bad), "bad.csv");
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([
      { path: "row 3, column B (co2_ppm)", message: '"oops" is not a number' },
      { path: "row 4, column A (year)", message: "2003 does not follow 2001; years must be consecutive and ascending" },
      { path: "row 4, column C (ozone_erf_wm2)", message: "is empty" },
      { path: "source", message: "must not be empty" },
      { path: "vintage", message: "must not be empty" },
    ]);
    expect(await t.ctx.models.Pathway.count()).toBe(before);
  });

  it("refuses other file types (400) and files over the size limit (413)", async () => {
    const type = await analyst.post("/api/pathways/upload").attach("file", Buffer.from("{}"), "pathway.json");
    expect(type.status).toBe(400);
    expect(type.body.error.code).toBe("unsupported_file_type");
    const big = await analyst.post("/api/pathways/upload").attach("file", Buffer.alloc(3 * 1024 * 1024, 0x31), "huge.csv");
    expect(big.status).toBe(413);
    expect((await actuary.post("/api/pathways/upload").attach("file", Buffer.from(csv), "x.csv")).status).toBe(403);
    expect((await request(t.app).post("/api/pathways/upload").attach("file", Buffer.from(csv), "x.csv")).status).toBe(401);
  });
});

describe("POST /api/pathways with a composer's recipe", () => {
  // Two small invented pathways over 2000–2003 to compose from.
  const basePathway = { name: "Recipe base", source: "test", vintage: "v1", startYear: 2000, agents: { co2: { erf: [1, 1.5, 2, 2.5] }, ozone: { erf: [0.25, 0.25, 0.5, 0.5] } } };
  const otherPathway = { ...basePathway, name: "Recipe other", agents: { co2: { erf: [3, 3, 3, 3] }, ozone: { erf: [0, 0, 0, 0] } } };

  it("replays the recipe from the stored pathways, saves the body when it matches and audits the recipe", async () => {
    const base = (await analyst.post("/api/pathways").send(basePathway)).body as { id: string };
    const other = (await analyst.post("/api/pathways").send(otherPathway)).body as { id: string };
    const recipe = {
      basePathwayId: base.id,
      steps: [
        { kind: "scale", agent: "co2", factor: 2 },
        { kind: "splice", agent: "ozone", sourcePathwayId: other.id, fromYear: 2002, toYear: 2003 },
        { kind: "extend", toYear: 2005, method: "hold" },
      ],
    };
    // By hand: CO2 doubled then held; ozone 2002–2003 taken from the other pathway (0), then held.
    const agents = { co2: { erf: [2, 3, 4, 5, 5, 5] }, ozone: { erf: [0.25, 0.25, 0, 0, 0, 0] } };
    const res = await analyst.post("/api/pathways").send({ ...basePathway, name: "Composed", startYear: 2000, agents, recipe });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ endYear: 2005, agents });
    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "pathway.created", entityId: res.body.id } });
    expect(audit?.get("summary")).toContain(`from the composer (Composed in Plumeline from "Recipe base" (id ${base.id}): 1. CO2 scaled by 2 in every year.`);
    expect(audit?.get("data")).toMatchObject({ origin: "composer", recipe });

    const tampered = await analyst.post("/api/pathways").send({ ...basePathway, name: "Tampered", agents: { ...agents, ozone: { erf: [0.25, 0.25, 0, 0.1, 0, 0] } }, recipe });
    expect(tampered.status).toBe(400);
    expect(tampered.body.error.details).toEqual([
      { path: "recipe", message: "does not reproduce the submitted series (first difference: Ozone in 2003); a pathway it names may have been edited meanwhile" },
    ]);
  });

  it("names a missing pathway and a step that cannot be replayed by their field", async () => {
    const base = (await analyst.post("/api/pathways").send(basePathway)).body as { id: string };
    const missing = await analyst
      .post("/api/pathways")
      .send({ ...basePathway, recipe: { basePathwayId: base.id, steps: [{ kind: "blend", otherPathwayId: "no-such-pathway", weight: 0.5 }] } });
    expect(missing.status).toBe(400);
    expect(missing.body.error.details).toEqual([{ path: "recipe.steps[0].otherPathwayId", message: "names no pathway (no-such-pathway)" }]);
    const late = await analyst.post("/api/pathways").send({ ...basePathway, recipe: { basePathwayId: base.id, steps: [{ kind: "extend", toYear: 2003, method: "hold" }] } });
    expect(late.status).toBe(400);
    expect(late.body.error.details).toEqual([{ path: "recipe.steps[0].toYear", message: "toYear 2003 must come after the pathway's last year 2003" }]);
  });
});

describe("PATCH /api/pathways/:id", () => {
  it("edits an unused pathway, and answers 409 once an approved version pins it", async () => {
    const created = await analyst.post("/api/pathways").send(testPathwayBody("Editable"));
    const edited = await analyst.patch(`/api/pathways/${created.body.id}`).send({ vintage: "v2" });
    expect(edited.status).toBe(200);
    expect(edited.body.vintage).toBe("v2");

    const author = await user("analyst");
    const version = await createModelVersion(t.ctx, author, testModelVersionBody({ pathwayIds: [created.body.id] }));
    await submitModelVersion(t.ctx, author, version.id, "minor");
    await decideModelVersion(t.ctx, await user("manager2"), version.id, "approved", "fine");

    const locked = await analyst.patch(`/api/pathways/${created.body.id}`).send({ vintage: "v3" });
    expect(locked.status).toBe(409);
    expect(locked.body.error.code).toBe("pathway_locked");
    expect((await analyst.get(`/api/pathways/${created.body.id}`)).body).toMatchObject({ locked: true, vintage: "v2" });
  });
});
