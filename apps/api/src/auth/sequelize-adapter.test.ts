import type { CleanedWhere } from "better-auth/adapters";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, type TestContext } from "../test-support/test-context.js";
import { toWhere } from "./sequelize-adapter.js";

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
  // Extra rows whose names exercise the edge cases: a literal % and _ must not act as wildcards.
  const now = new Date();
  for (const [id, name, email, role] of [
    ["w1", "Ada 100% sure", "ada@w.example", "analyst"],
    ["w2", "Bo_b", "bob@w.example", "actuary"],
    ["w3", "Carla", "CARLA@w.example", "manager"],
  ] as const) {
    await t.ctx.models.User.create({ id, name, email, role, emailVerified: false, createdAt: now, updatedAt: now });
  }
});
afterAll(async () => {
  await t.close();
});

const w = (field: string, operator: CleanedWhere["operator"], value: CleanedWhere["value"], extra: Partial<CleanedWhere> = {}): CleanedWhere => ({
  field,
  operator,
  value,
  connector: "AND",
  mode: "sensitive",
  ...extra,
});

async function ids(where: CleanedWhere[]): Promise<string[]> {
  const rows = await t.ctx.models.User.findAll({ where: toWhere(t.ctx.models.User, where), attributes: ["id"] });
  // Only this file's rows: the context's own users have random ids, and one may start with "w".
  return rows.map((r) => r.id).filter((id) => /^w\d$/.test(id)).sort();
}

// Expected sets worked out by hand from the three rows above.
describe("toWhere: better-auth where clauses on SQLite", () => {
  it("eq / ne / in / not_in", async () => {
    expect(await ids([w("role", "eq", "actuary")])).toEqual(["w2"]);
    expect(await ids([w("role", "ne", "actuary")])).toEqual(["w1", "w3"]);
    expect(await ids([w("id", "in", ["w1", "w3", "zz"])])).toEqual(["w1", "w3"]);
    expect(await ids([w("id", "not_in", ["w1"])])).toEqual(["w2", "w3"]);
    expect(await ids([w("image", "eq", null)])).toEqual(["w1", "w2", "w3"]);
  });

  it("lt / lte / gt / gte compare in column order", async () => {
    expect(await ids([w("id", "lt", "w2")])).toEqual(["w1"]);
    expect(await ids([w("id", "lte", "w2")])).toEqual(["w1", "w2"]);
    expect(await ids([w("id", "gt", "w2")])).toEqual(["w3"]);
    expect(await ids([w("id", "gte", "w2")])).toEqual(["w2", "w3"]);
  });

  it("contains / starts_with / ends_with match literally (no LIKE wildcards) and by case", async () => {
    expect(await ids([w("name", "contains", "0% s")])).toEqual(["w1"]);
    expect(await ids([w("name", "contains", "%")])).toEqual(["w1"]);
    expect(await ids([w("name", "contains", "_")])).toEqual(["w2"]);
    expect(await ids([w("name", "starts_with", "Bo_")])).toEqual(["w2"]);
    expect(await ids([w("name", "ends_with", "rla")])).toEqual(["w3"]);
    expect(await ids([w("name", "starts_with", "carla")])).toEqual([]);
  });

  it("insensitive mode lowers both sides", async () => {
    expect(await ids([w("email", "eq", "carla@w.example", { mode: "insensitive" })])).toEqual(["w3"]);
    expect(await ids([w("name", "starts_with", "carla", { mode: "insensitive" })])).toEqual(["w3"]);
  });

  it("AND clauses all hold; OR clauses need one to hold as well", async () => {
    expect(await ids([w("role", "ne", "manager"), w("email", "ends_with", "w.example")])).toEqual(["w1", "w2"]);
    expect(await ids([w("id", "eq", "w1", { connector: "OR" }), w("id", "eq", "w3", { connector: "OR" })])).toEqual(["w1", "w3"]);
    expect(await ids([w("role", "ne", "analyst"), w("id", "eq", "w1", { connector: "OR" }), w("id", "eq", "w3", { connector: "OR" })])).toEqual(["w3"]);
  });
});

describe("the adapter through better-auth", () => {
  it("counts, pages and sorts users via better-auth's internal adapter", async () => {
    const authContext = await t.ctx.auth.$context;
    const adapter = authContext.adapter;
    const total = await adapter.count({ model: "user", where: [{ field: "email", operator: "ends_with", value: "w.example" }] });
    expect(total).toBe(3);
    const page = await adapter.findMany<{ id: string }>({
      model: "user",
      where: [{ field: "email", operator: "ends_with", value: "w.example" }],
      sortBy: { field: "name", direction: "desc" },
      limit: 2,
      offset: 1,
    });
    // Names descending: Carla, Bo_b, Ada 100% sure -> skip one, take two.
    expect(page.map((u) => u.id)).toEqual(["w2", "w1"]);
    const updated = await adapter.updateMany({ model: "user", where: [{ field: "id", operator: "in", value: ["w1", "w2"] }], update: { image: "x.png" } });
    expect(updated).toBe(2);
    const deleted = await adapter.deleteMany({ model: "user", where: [{ field: "image", operator: "eq", value: "x.png" }] });
    expect(deleted).toBe(2);
    expect(await adapter.findOne({ model: "user", where: [{ field: "id", value: "w1" }] })).toBeNull();
  });
});
