import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { expectBadQuery, setCreatedAt } from "../../test-support/list-fixtures.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testModelVersionBody } from "../runs/runs.fixtures.js";

let t: TestContext;
let manager: SignedInAgent;

beforeAll(async () => {
  t = await createTestContext();
  manager = await signIn(t.app, "manager");
  const analyst = await signIn(t.app, "analyst");
  const rows = [
    { name: "Core assumptions", notes: "baseline tail", day: "2026-03-01" },
    { name: "Constrained ECS", notes: "narrower 5_95 band", day: "2026-03-02" },
    { name: "Wide tail", notes: "fat tail for stress tests", day: "2026-03-03" },
  ];
  for (const row of rows) {
    const res = await analyst.post("/api/model-versions").send(testModelVersionBody({ name: row.name, notes: row.notes }));
    expect(res.status).toBe(201);
    await setCreatedAt(t, "model_versions", res.body.id, `${row.day}T08:00:00Z`);
  }
});
afterAll(async () => {
  await t.close();
});

const names = (body: { items: Array<{ name: string }> }) => body.items.map((r) => r.name);

describe("GET /api/model-versions as a paged list", () => {
  it("pages with the total and sorts by name and creation", async () => {
    const p1 = await manager.get("/api/model-versions?sort=name:asc&limit=2");
    expect(p1.status).toBe(200);
    expect(p1.body.total).toBe(3);
    expect(names(p1.body)).toEqual(["Constrained ECS", "Core assumptions"]);
    expect(names((await manager.get("/api/model-versions?sort=name:asc&limit=2&offset=2")).body)).toEqual(["Wide tail"]);
    expect(names((await manager.get("/api/model-versions?sort=createdAt:asc")).body)).toEqual([
      "Core assumptions",
      "Constrained ECS",
      "Wide tail",
    ]);
  });

  it("searches name and notes case-insensitively, _ literally", async () => {
    expect(names((await manager.get("/api/model-versions?q=TAIL&sort=name:asc")).body)).toEqual(["Core assumptions", "Wide tail"]);
    expect(names((await manager.get("/api/model-versions?q=5_9")).body)).toEqual(["Constrained ECS"]);
    expect((await manager.get("/api/model-versions?q=5_8")).body.total).toBe(0);
  });

  it("filters by status, author and creation date", async () => {
    expect((await manager.get("/api/model-versions?status=draft")).body.total).toBe(3);
    expect((await manager.get("/api/model-versions?status=approved")).body.total).toBe(0);
    expect((await manager.get("/api/model-versions?author=ines")).body.total).toBe(3);
    expect((await manager.get("/api/model-versions?author=ruth")).body.total).toBe(0);
    expect(names((await manager.get("/api/model-versions?from=2026-03-02T00:00:00Z&to=2026-03-03")).body)).toEqual([
      "Wide tail",
      "Constrained ECS",
    ]);
  });

  it("answers 400 naming each bad query field", async () => {
    await expectBadQuery(manager, "/api/model-versions?status=nonsense&sort=model:desc&offset=1.5", ["status", "sort", "offset"]);
    await expectBadQuery(manager, "/api/model-versions?mine=yes&undrafted=0", ["mine", "undrafted"]);
  });

  // Last: it adds a version drafted from another.
  it("filters the signed-in person's own versions (mine) and those nothing was drafted from (undrafted)", async () => {
    const analyst = await signIn(t.app, "analyst");
    expect((await analyst.get("/api/model-versions?mine=true")).body.total).toBe(3);
    expect((await manager.get("/api/model-versions?mine=true")).body.total).toBe(0);
    expect((await manager.get("/api/model-versions?mine=false")).body.total).toBe(3);
    const core = (await manager.get("/api/model-versions?q=core")).body.items[0];
    const child = await analyst.post("/api/model-versions").send(testModelVersionBody({ name: "Core assumptions, redrafted", parentId: core.id }));
    expect(child.status).toBe(201);
    expect(names((await manager.get("/api/model-versions?undrafted=false")).body)).toEqual(["Core assumptions"]);
    expect(names((await manager.get("/api/model-versions?undrafted=true&q=core")).body)).toEqual(["Core assumptions, redrafted"]);
    expect((await manager.get("/api/model-versions?undrafted=true")).body.total).toBe(3);
  });
});
