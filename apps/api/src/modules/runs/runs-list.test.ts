import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { expectBadQuery, idsOf, insertRun, setCreatedAt } from "../../test-support/list-fixtures.js";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testModelVersionBody } from "./runs.fixtures.js";

let t: TestContext;
let actuary: SignedInAgent;
const ids: Record<string, string> = {};

// Names chosen so that an unescaped % or _ in a LIKE pattern would match every row.
const ROWS = [
  { name: "Coastal 100% stress", by: "analyst", status: "succeeded", members: 500, day: "2026-01-01" },
  { name: "Coastal_base", by: "actuary", status: "failed", members: 200, day: "2026-01-02" },
  { name: "Inland base", by: "analyst", status: "succeeded", members: 300, day: "2026-01-03" },
  { name: "Inland stress", by: "actuary", status: "queued", members: 100, day: "2026-01-04" },
  { name: "Harbour base", by: "analyst", status: "succeeded", members: 400, day: "2026-01-05", exploratory: false },
] as const;

beforeAll(async () => {
  t = await createTestContext();
  actuary = await signIn(t.app, "actuary");
  const analyst = await signIn(t.app, "analyst");
  const version = await analyst.post("/api/model-versions").send(testModelVersionBody());
  for (const row of ROWS) {
    ids[row.name] = await insertRun(t, {
      name: row.name,
      modelVersionId: version.body.id,
      createdBy: t.userIds[row.by],
      status: row.status,
      members: row.members,
      exploratory: "exploratory" in row ? row.exploratory : true,
    });
    await setCreatedAt(t, "runs", ids[row.name]!, `${row.day}T12:00:00Z`);
  }
});
afterAll(async () => {
  await t.close();
});

const names = (body: { items: Array<{ name: string }> }) => body.items.map((r) => r.name);

describe("GET /api/runs as a paged list", () => {
  it("answers { items, total }, newest first by default, 50 to a page", async () => {
    const res = await actuary.get("/api/runs");
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(5);
    expect(names(res.body)).toEqual(["Harbour base", "Inland stress", "Inland base", "Coastal_base", "Coastal 100% stress"]);
  });

  it("pages with limit and offset while total counts every match", async () => {
    const p1 = await actuary.get("/api/runs?sort=name:asc&limit=2");
    const p2 = await actuary.get("/api/runs?sort=name:asc&limit=2&offset=2");
    const p3 = await actuary.get("/api/runs?sort=name:asc&limit=2&offset=4");
    expect([p1.body.total, p2.body.total, p3.body.total]).toEqual([5, 5, 5]);
    // SQLite orders text by bytes: " " (0x20) sorts before "_" (0x5f).
    expect([...names(p1.body), ...names(p2.body), ...names(p3.body)]).toEqual([
      "Coastal 100% stress",
      "Coastal_base",
      "Harbour base",
      "Inland base",
      "Inland stress",
    ]);
    expect((await actuary.get("/api/runs?offset=10")).body).toEqual({ items: [], total: 5 });
  });

  it("sorts by each allowed key in both directions", async () => {
    expect(names((await actuary.get("/api/runs?sort=members:desc")).body)).toEqual([
      "Coastal 100% stress",
      "Harbour base",
      "Inland base",
      "Coastal_base",
      "Inland stress",
    ]);
    expect(names((await actuary.get("/api/runs?sort=createdAt:asc")).body)[0]).toBe("Coastal 100% stress");
    expect((await actuary.get("/api/runs?sort=status:asc")).body.items.map((r: { status: string }) => r.status)).toEqual([
      "failed",
      "queued",
      "succeeded",
      "succeeded",
      "succeeded",
    ]);
  });

  it("searches names case-insensitively and takes % and _ literally", async () => {
    expect(names((await actuary.get("/api/runs?q=COASTAL&sort=name:asc")).body)).toEqual(["Coastal 100% stress", "Coastal_base"]);
    expect(names((await actuary.get("/api/runs?q=%25")).body)).toEqual(["Coastal 100% stress"]);
    expect(names((await actuary.get("/api/runs?q=_")).body)).toEqual(["Coastal_base"]);
    expect((await actuary.get("/api/runs?q=nothing-like-this")).body).toEqual({ items: [], total: 0 });
  });

  it("filters by status, author (name or email), mine and creation date", async () => {
    expect((await actuary.get("/api/runs?status=succeeded")).body.total).toBe(3);
    // Tobias Wrenfield is the demo actuary.
    expect(names((await actuary.get("/api/runs?author=wrenfield&sort=name:asc")).body)).toEqual(["Coastal_base", "Inland stress"]);
    expect((await actuary.get("/api/runs?author=analyst@harbourline")).body.total).toBe(3);
    expect((await actuary.get("/api/runs?mine=true")).body.total).toBe(2);
    // Made with an approved version or not (the desk lists exploratory results on their own).
    expect(names((await actuary.get("/api/runs?exploratory=false")).body)).toEqual(["Harbour base"]);
    expect((await actuary.get("/api/runs?exploratory=true&status=succeeded")).body.total).toBe(2);
    expect(names((await actuary.get("/api/runs?from=2026-01-02&to=2026-01-04&sort=createdAt:asc")).body)).toEqual([
      "Coastal_base",
      "Inland base",
      "Inland stress",
    ]);
    expect((await actuary.get("/api/runs?to=2026-01-01T11:59:59Z")).body.total).toBe(0);
    expect(idsOf((await actuary.get("/api/runs?status=succeeded&author=ines&q=base&from=2026-01-04")).body)).toEqual([ids["Harbour base"]]);
  });

  it("answers 400 naming each bad query field", async () => {
    await expectBadQuery(actuary, "/api/runs?limit=0&offset=-1", ["limit", "offset"]);
    await expectBadQuery(actuary, "/api/runs?limit=201", ["limit"]);
    await expectBadQuery(actuary, "/api/runs?sort=seed:asc", ["sort"]);
    await expectBadQuery(actuary, "/api/runs?sort=name", ["sort"]);
    await expectBadQuery(actuary, "/api/runs?from=yesterday&to=2026-13-01&status=bogus", ["from", "to", "status"]);
    await expectBadQuery(actuary, "/api/runs?exploratory=yes&mine=1", ["exploratory", "mine"]);
  });
});
