import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { expectBadQuery, setCreatedAt } from "../../test-support/list-fixtures.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testPathwayBody } from "../runs/runs.fixtures.js";

let t: TestContext;
let manager: SignedInAgent;

beforeAll(async () => {
  t = await createTestContext();
  manager = await signIn(t.app, "manager");
  const analyst = await signIn(t.app, "analyst");
  const rows = [
    { name: "Alpha 50% cut", vintage: "v1", day: "2026-02-01" },
    { name: "Beta_ramp", vintage: "v2", day: "2026-02-02" },
    { name: "Gamma ramp", vintage: "northmere-2026", day: "2026-02-03" },
  ];
  for (const row of rows) {
    const res = await analyst.post("/api/pathways").send({ ...testPathwayBody(row.name), vintage: row.vintage });
    expect(res.status).toBe(201);
    await setCreatedAt(t, "pathways", res.body.id, `${row.day}T08:00:00Z`);
  }
});
afterAll(async () => {
  await t.close();
});

const names = (body: { items: Array<{ name: string }> }) => body.items.map((r) => r.name);

describe("GET /api/pathways as a paged list", () => {
  it("pages newest first with the total", async () => {
    const p1 = await manager.get("/api/pathways?limit=2");
    expect(p1.status).toBe(200);
    expect(p1.body.total).toBe(3);
    expect(names(p1.body)).toEqual(["Gamma ramp", "Beta_ramp"]);
    expect(names((await manager.get("/api/pathways?limit=2&offset=2")).body)).toEqual(["Alpha 50% cut"]);
  });

  it("sorts by name both ways", async () => {
    expect(names((await manager.get("/api/pathways?sort=name:asc")).body)).toEqual(["Alpha 50% cut", "Beta_ramp", "Gamma ramp"]);
    expect(names((await manager.get("/api/pathways?sort=name:desc")).body)).toEqual(["Gamma ramp", "Beta_ramp", "Alpha 50% cut"]);
  });

  it("searches name and vintage case-insensitively, % and _ literally", async () => {
    expect(names((await manager.get("/api/pathways?q=GAMMA")).body)).toEqual(["Gamma ramp"]);
    // The fixture's source ("hand-made test ramp") is searched too, so every row matches.
    expect((await manager.get("/api/pathways?q=Hand-Made")).body.total).toBe(3);
    expect(names((await manager.get("/api/pathways?q=northmere")).body)).toEqual(["Gamma ramp"]);
    expect(names((await manager.get("/api/pathways?q=%25")).body)).toEqual(["Alpha 50% cut"]);
    expect(names((await manager.get("/api/pathways?q=_")).body)).toEqual(["Beta_ramp"]);
  });

  it("filters by author, lock and creation date", async () => {
    // Ines Calloway is the demo analyst who uploaded them all.
    expect((await manager.get("/api/pathways?author=calloway")).body.total).toBe(3);
    expect((await manager.get("/api/pathways?author=oyelaran")).body.total).toBe(0);
    expect((await manager.get("/api/pathways?locked=true")).body.total).toBe(0);
    expect((await manager.get("/api/pathways?locked=false")).body.total).toBe(3);
    expect(names((await manager.get("/api/pathways?from=2026-02-02&to=2026-02-02")).body)).toEqual(["Beta_ramp"]);
  });

  it("answers 400 naming each bad query field", async () => {
    await expectBadQuery(manager, "/api/pathways?limit=abc&sort=checksum:asc&locked=maybe&from=2026-02-30x", [
      "limit",
      "sort",
      "locked",
      "from",
    ]);
  });
});
