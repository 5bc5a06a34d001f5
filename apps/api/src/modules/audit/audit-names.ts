import { Op } from "sequelize";
import type { Models } from "../../db/models.js";

/**
 * The tables that hold a name for each audited entity type. The audit row keeps only ids
 * (it is append-only and must not be rewritten when a name changes), so names are looked
 * up when the trail is read: the screen shows and searches today's names.
 */
export const ENTITY_NAME_SOURCES: Readonly<Record<string, { table: string; nameColumns: readonly string[] }>> = {
  run: { table: "runs", nameColumns: ["name"] },
  pathway: { table: "pathways", nameColumns: ["name"] },
  "model-version": { table: "model_versions", nameColumns: ["name"] },
  "peril-profile": { table: "peril_profiles", nameColumns: ["name"] },
  portfolio: { table: "portfolios", nameColumns: ["name"] },
  user: { table: "users", nameColumns: ["name", "email"] },
};

interface NamedRow {
  entityType: string;
  entityId: string | null;
  actorId: string | null;
}

/** `type:id` -> display name for every entity in the rows, and actor id -> name. */
export async function auditNames(
  models: Models,
  rows: readonly NamedRow[],
): Promise<{ entity: Map<string, string>; actor: Map<string, string> }> {
  const idsOf = (type: string) => [...new Set(rows.filter((r) => r.entityType === type && r.entityId !== null).map((r) => r.entityId!))];
  const userIds = [...new Set([...idsOf("user"), ...rows.map((r) => r.actorId).filter((id): id is string => id !== null)])];
  const inIds = (ids: string[]) => ({ where: { id: { [Op.in]: ids } } });
  const [runs, pathways, versions, profiles, portfolios, users] = await Promise.all([
    models.Run.findAll({ ...inIds(idsOf("run")), attributes: ["id", "name"] }),
    models.Pathway.findAll({ ...inIds(idsOf("pathway")), attributes: ["id", "name"] }),
    models.ModelVersion.findAll({ ...inIds(idsOf("model-version")), attributes: ["id", "name", "versionNumber"] }),
    models.PerilProfile.findAll({ ...inIds(idsOf("peril-profile")), attributes: ["id", "name"] }),
    models.Portfolio.findAll({ ...inIds(idsOf("portfolio")), attributes: ["id", "name"] }),
    models.User.findAll({ ...inIds(userIds), attributes: ["id", "name"] }),
  ]);
  const entity = new Map<string, string>();
  for (const r of runs) entity.set(`run:${r.id}`, r.name);
  for (const p of pathways) entity.set(`pathway:${p.id}`, p.name);
  for (const v of versions) entity.set(`model-version:${v.id}`, `${v.name} v${v.versionNumber}`);
  for (const p of profiles) entity.set(`peril-profile:${p.id}`, p.name);
  for (const p of portfolios) entity.set(`portfolio:${p.id}`, p.name);
  for (const u of users) entity.set(`user:${u.id}`, u.name);
  return { entity, actor: new Map(users.map((u) => [u.id, u.name])) };
}
