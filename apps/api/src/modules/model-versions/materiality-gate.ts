import { IMPACT_DEFAULT_MEMBERS, type MaterialityFiring } from "@plumeline/contracts";
import type { AppContext } from "../../context.js";
import { AppError } from "../../errors/app-error.js";
import { previewImpact, resolvePathways } from "./model-version-impact.service.js";
import { describeFiring } from "./materiality-check.js";
import type { ModelVersionModel } from "./model-version.model.js";

type Ctx = Pick<AppContext, "models">;

/** What the gate found, kept in the submission's audit row. */
export interface MaterialityCheck {
  checked: boolean;
  /** Why nothing was checked (no parent, no pathway), else null. */
  skipped: string | null;
  pathwayIds: string[];
  members: number;
  fired: MaterialityFiring[];
}

/**
 * A change filed as "minor" must stay under every materiality threshold on every pathway the
 * version pins: the same preview the reviewer sees (default members, against the parent) is
 * made, and any threshold it passes refuses the filing with 409 `materiality_threshold_exceeded`,
 * one detail per firing (pathway, year, metric, value, limit). Re-classing as "major" files it.
 * With no parent there is nothing to compare with, so nothing is checked (the audit says so).
 */
export async function checkMinorChange(ctx: Ctx, version: ModelVersionModel): Promise<MaterialityCheck> {
  const members = IMPACT_DEFAULT_MEMBERS;
  const skip = (skipped: string): MaterialityCheck => ({ checked: false, skipped, pathwayIds: [], members, fired: [] });
  if (!version.parentId) return skip("no parent to compare with");
  const parent = await ctx.models.ModelVersion.findByPk(version.parentId);
  if (!parent) return skip(`parent ${version.parentId} no longer exists`);
  let pathways;
  try {
    pathways = await resolvePathways(ctx, undefined, version, parent);
  } catch (error) {
    if (error instanceof AppError && error.status === 400) return skip("no pathway to preview on");
    throw error;
  }
  const impact = await previewImpact(ctx, version, parent, pathways, members);
  const fired = impact.materiality.fired;
  if (fired.length > 0)
    throw new AppError(
      409,
      "materiality_threshold_exceeded",
      `"${version.name}" v${version.versionNumber} cannot be filed as a minor change: its preview passes ${fired.length} materiality threshold${fired.length === 1 ? "" : "s"} (first: ${describeFiring(fired[0]!)}). File it as a major change, or change the draft.`,
      fired.map((f) => ({
        path: "changeClass",
        message: describeFiring(f),
        data: { pathwayId: f.pathwayId, pathwayName: f.pathwayName, year: f.year, metric: f.metric, warmingThreshold: f.warmingThreshold, value: f.value, limit: f.limit, unit: f.unit },
      })),
    );
  return { checked: true, skipped: null, pathwayIds: pathways.map((p) => p.id), members, fired };
}
