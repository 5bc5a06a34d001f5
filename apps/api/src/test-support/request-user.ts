import type { DemoUser } from "@plumeline/seeds";
import type { RequestUser } from "../middleware/request-context.js";
import type { TestContext } from "./test-context.js";

/** The seeded user `key` as services see a signed-in caller, for calling services directly in tests. */
export async function requestUserOf(t: TestContext, key: DemoUser["key"]): Promise<RequestUser> {
  const row = await t.ctx.models.User.findByPk(t.userIds[key]);
  if (!row) throw new Error(`test user ${key} is missing`);
  return { id: row.id, email: row.email, name: row.name, role: row.role, mustChangePassword: false };
}
