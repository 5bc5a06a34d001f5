import type { CreatePathwayBody } from "@plumeline/contracts";
import { demoModelVersions, demoPathways } from "@plumeline/seeds";
import type { AppContext } from "../context.js";
import type { RequestUser } from "../middleware/request-context.js";
import { createModelVersion, decideModelVersion, submitModelVersion } from "../modules/model-versions/model-versions.service.js";
import { createPathway } from "../modules/pathways/pathways.service.js";
import type { SeededUserIds } from "./seed-users.js";

/**
 * Demo domain data on first start: the Harbourline pathways, the approved core model version
 * (constrained by the observed 2011–2020 warming; drafted by the analyst, approved by the first
 * manager with a comment stating what it reproduces) and a draft trial built on it.
 * It goes through the same services as the API, so the audit trail and outbox show the story.
 */
export async function seedDomain(ctx: AppContext, userIds: SeededUserIds): Promise<{ pathways: number; modelVersions: number }> {
  const asUser = async (key: keyof SeededUserIds): Promise<RequestUser> => {
    const row = await ctx.models.User.findByPk(userIds[key]);
    if (!row) throw new Error(`seed user ${key} is missing`);
    return { id: row.id, email: row.email, name: row.name, role: row.role, mustChangePassword: false };
  };
  const analyst = await asUser("analyst");
  const pathwayIds = new Map<string, string>();
  for (const p of demoPathways) {
    const { key, ...body } = p;
    const created = await createPathway(ctx, analyst, body as CreatePathwayBody, "demo seed");
    pathwayIds.set(key, created.id);
  }
  let parentId: string | null = null;
  for (const v of demoModelVersions) {
    const { pathwayKeys, ...body } = v.body;
    const author = await asUser(v.author);
    const created = await createModelVersion(ctx, author, {
      ...body,
      parentId,
      pathwayIds: pathwayKeys.map((k) => pathwayIds.get(k)!).filter(Boolean),
    });
    if (v.approve) {
      await submitModelVersion(ctx, author, created.id, v.approve.changeClass, "Demo seed: first assumptions for approval, constrained by the observed 2011–2020 warming.");
      await decideModelVersion(ctx, await asUser(v.approve.by), created.id, "approved", v.approve.comment);
    }
    parentId = created.id;
  }
  return { pathways: demoPathways.length, modelVersions: demoModelVersions.length };
}
