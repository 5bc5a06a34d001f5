import { demoOrganisation, demoUsers } from "@plumeline/seeds";
import type { AppContext } from "../context.js";
import { recordAudit } from "../modules/audit/audit.service.js";
import { seedDomain } from "./seed-domain.js";
import { seedPerils } from "./seed-perils.js";
import { seedUsers } from "./seed-users.js";

/**
 * Loads the demo insurer on first start: only when the database has no users at all, so
 * a real installation (or a demo someone has changed) is never touched. Returns whether
 * it loaded anything.
 */
export async function loadDemoSeed(ctx: AppContext): Promise<boolean> {
  if ((await ctx.models.User.count()) > 0) return false;
  const userIds = await seedUsers(ctx, demoUsers);
  await seedDomain(ctx, userIds);
  await seedPerils(ctx, userIds);
  await recordAudit(ctx, {
    actorId: null,
    action: "seed.loaded",
    entityType: "organisation",
    entityId: demoOrganisation.name,
    summary: `Demo data for ${demoOrganisation.name} loaded (${demoUsers.length} users).`,
    data: { users: Object.keys(userIds) },
  });
  return true;
}
