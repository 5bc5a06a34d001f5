import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { expectBadQuery, setCreatedAt } from "../../test-support/list-fixtures.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testRainfallProfileBody } from "../runs/runs.fixtures.js";

let t: TestContext;
let manager: SignedInAgent;

beforeAll(async () => {
  t = await createTestContext();
  manager = await signIn(t.app, "manager");
  const analyst = await signIn(t.app, "analyst");
  const actuary = await signIn(t.app, "actuary");
  const rows = [
    { by: analyst, name: "Rainfall north", region: "Northmere Coast", metric: "severity", day: "2026-04-01" },
    { by: actuary, name: "Rainfall south", region: "Southwold Vale", metric: "frequency", day: "2026-04-02" },
    { by: analyst, name: "Rainfall 10% uplift", region: "Northmere Coast", metric: "severity", day: "2026-04-03" },
  ];
  for (const row of rows) {
    const res = await row.by
      .post("/api/peril-profiles")
      .send({ ...testRainfallProfileBody, name: row.name, region: row.region, metric: row.metric });
    expect(res.status).toBe(201);
    await setCreatedAt(t, "peril_profiles", res.body.id, `${row.day}T08:00:00Z`);
  }
});
afterAll(async () => {
  await t.close();
});

const names = (body: { items: Array<{ name: string }> }) => body.items.map((r) => r.name);

describe("GET /api/peril-profiles as a paged list", () => {
  it("orders by peril, region and name by default and pages with the total", async () => {
    const p1 = await manager.get("/api/peril-profiles?limit=2");
    expect(p1.status).toBe(200);
    expect(p1.body.total).toBe(3);
    expect(names(p1.body)).toEqual(["Rainfall 10% uplift", "Rainfall north"]);
    expect(names((await manager.get("/api/peril-profiles?limit=2&offset=2")).body)).toEqual(["Rainfall south"]);
    expect(names((await manager.get("/api/peril-profiles?sort=region:desc")).body)[0]).toBe("Rainfall south");
  });

  it("searches name and region case-insensitively, % literally", async () => {
    expect((await manager.get("/api/peril-profiles?q=NORTHMERE")).body.total).toBe(2);
    expect(names((await manager.get("/api/peril-profiles?q=%25")).body)).toEqual(["Rainfall 10% uplift"]);
  });

  it("filters by metric, author and creation date", async () => {
    expect(names((await manager.get("/api/peril-profiles?metric=frequency")).body)).toEqual(["Rainfall south"]);
    expect(names((await manager.get("/api/peril-profiles?author=wrenfield")).body)).toEqual(["Rainfall south"]);
    expect(names((await manager.get("/api/peril-profiles?from=2026-04-03")).body)).toEqual(["Rainfall 10% uplift"]);
  });

  it("answers 400 naming each bad query field", async () => {
    await expectBadQuery(manager, "/api/peril-profiles?metric=loss&limit=1000&to=soon", ["metric", "limit", "to"]);
  });
});
