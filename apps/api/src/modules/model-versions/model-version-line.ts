import { Op, type Transaction } from "sequelize";
import type { AppContext } from "../../context.js";
import type { ModelVersionModel } from "./model-version.model.js";

/**
 * Where a version sits in its line of descent, which is what its number counts. A version that
 * keeps its parent's name continues the parent's line (Base v2 -> Base v3); one given a new name
 * starts a line of its own at v1 (a "Constrained" draft copied from Base v2 is "Constrained v1",
 * with Base v2 as its parent), so a name never shows a number whose earlier versions do not exist
 * under that name. `familyId` is the line's key; the number is one above the line's highest.
 */
export async function placeInLine(
  ctx: Pick<AppContext, "models">,
  version: { id: string; name: string; parent: Pick<ModelVersionModel, "name" | "familyId"> | null },
  transaction: Transaction,
): Promise<{ familyId: string; versionNumber: number }> {
  const familyId = version.parent && version.parent.name === version.name ? version.parent.familyId : version.id;
  const highest = await ctx.models.ModelVersion.max<number | null, ModelVersionModel>("versionNumber", {
    where: { familyId, id: { [Op.ne]: version.id } },
    transaction,
  });
  return { familyId, versionNumber: (highest ?? 0) + 1 };
}
