import { randomUUID } from "node:crypto";
import { expect } from "vitest";
import type { SignedInAgent } from "./sign-in.js";
import type { TestContext } from "./test-context.js";

/**
 * Helpers for the list tests (paging, search, sort, filters). Rows are made through the API
 * where that is cheap; runs and exports, which need the engine to exist for real, are written
 * straight into their tables: the lists only read them.
 */

/** Moves a row's creation time, so date filters have something to tell apart. */
export async function setCreatedAt(t: TestContext, table: string, id: string, iso: string): Promise<void> {
  await t.ctx.sequelize.query(`UPDATE ${table} SET created_at = ? WHERE id = ?`, {
    replacements: [new Date(iso).toISOString().replace("T", " ").replace("Z", " +00:00"), id],
  });
}

/** A queued run row (no spec the engine would accept: listing never reads it). */
export async function insertRun(
  t: TestContext,
  fields: { name: string; modelVersionId: string; createdBy: string; status?: string; members?: number; exploratory?: boolean },
): Promise<string> {
  const id = randomUUID();
  await t.ctx.models.Run.create({
    id,
    name: fields.name,
    modelVersionId: fields.modelVersionId,
    pathwayIds: [],
    members: fields.members ?? 100,
    seed: "list-test",
    sampling: "latin-hypercube",
    spec: {},
    inputHash: "0".repeat(64),
    exploratory: fields.exploratory ?? true,
    status: fields.status ?? "queued",
    progress: 0,
    perilProfileIds: [],
    createdBy: fields.createdBy,
  });
  return id;
}

/** The ids of a `{ items, total }` answer, in order. */
export const idsOf = (body: { items: Array<{ id: string | number }> }) => body.items.map((r) => r.id);

/** Every bad field of the query is named in the 400's details. */
export async function expectBadQuery(agent: SignedInAgent, url: string, fields: string[]): Promise<void> {
  const res = await agent.get(url);
  expect(res.status, url).toBe(400);
  expect(res.body.error.code).toBe("validation_failed");
  expect((res.body.error.details as Array<{ path: string }>).map((d) => d.path).sort()).toEqual([...fields].sort());
}
