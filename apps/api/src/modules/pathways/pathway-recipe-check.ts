import {
  AGENT_LABELS,
  composePathway,
  describeRecipe,
  FORCING_AGENTS,
  formatPath,
  type ErrorDetail,
  type PathwayData,
  type PathwayRecipe,
} from "@plumeline/contracts";
import { Op } from "sequelize";
import type { AppContext } from "../../context.js";
import { badRequest } from "../../errors/app-error.js";
import { pathwayChecksum } from "./pathway-checksum.js";

type Ctx = Pick<AppContext, "models">;

/** Every pathway id a recipe reads, each with the field that names it. */
function referencedIds(recipe: PathwayRecipe): Array<{ id: string; path: string }> {
  const refs = [{ id: recipe.basePathwayId, path: "recipe.basePathwayId" }];
  recipe.steps.forEach((step, i) => {
    if (step.kind === "splice") refs.push({ id: step.sourcePathwayId, path: formatPath(["recipe", "steps", i, "sourcePathwayId"]) });
    if (step.kind === "blend") refs.push({ id: step.otherPathwayId, path: formatPath(["recipe", "steps", i, "otherPathwayId"]) });
  });
  return refs;
}

/** Where two series objects first differ, as "CO2 in 2045" (for a reader, not a machine). */
function firstDifference(expected: PathwayData, given: PathwayData): string {
  if (expected.startYear !== given.startYear) return `the start year (${expected.startYear} replayed, ${given.startYear} given)`;
  for (const agent of FORCING_AGENTS) {
    const a = JSON.stringify(expected.agents[agent] ?? null);
    const b = JSON.stringify(given.agents[agent] ?? null);
    if (a === b) continue;
    const av = Object.values(expected.agents[agent] ?? {})[0] ?? [];
    const bv = Object.values(given.agents[agent] ?? {})[0] ?? [];
    const k = av.findIndex((v, i) => v !== bv[i]);
    return k >= 0 ? `${AGENT_LABELS[agent]} in ${expected.startYear + k}` : `${AGENT_LABELS[agent]} (presence, unit or length)`;
  }
  return "the series";
}

/**
 * Replays a composed pathway's recipe from the pathways it names (their stored numbers) and
 * refuses the body unless the replay gives exactly the submitted series — compared by
 * checksum, the canonical JSON of { startYear, agents }. So the audited recipe is provably how
 * the numbers were made. Returns the recipe and its plain-words summary for the audit row.
 */
export async function checkPathwayRecipe(
  ctx: Ctx,
  recipe: PathwayRecipe,
  given: PathwayData,
): Promise<{ recipe: PathwayRecipe; summary: string }> {
  const refs = referencedIds(recipe);
  const rows = await ctx.models.Pathway.findAll({ where: { id: { [Op.in]: [...new Set(refs.map((r) => r.id))] } } });
  const byId = new Map(
    rows.map((r) => [r.id, { name: r.name, data: { startYear: r.startYear, agents: r.agents as PathwayData["agents"] } }]),
  );
  const missing: ErrorDetail[] = refs.filter((r) => !byId.has(r.id)).map((r) => ({ path: r.path, message: `names no pathway (${r.id})` }));
  if (missing.length > 0) throw badRequest(missing, "The recipe names pathways that do not exist.");

  const base = byId.get(recipe.basePathwayId)!.data;
  const { outcomes, result } = composePathway(base, recipe.steps, (id) => byId.get(id)?.data);
  const failed = outcomes.findIndex((o) => !o.ok);
  if (!result) {
    const outcome = outcomes[failed];
    const error = outcome && !outcome.ok ? outcome.error : null;
    throw badRequest(
      [{ path: formatPath(["recipe", "steps", failed, error?.field ?? "kind"]), message: error?.message ?? "cannot be applied" }],
      "The recipe cannot be replayed on the stored pathways.",
    );
  }
  if (pathwayChecksum(result.startYear, result.agents) !== pathwayChecksum(given.startYear, given.agents))
    throw badRequest(
      [
        {
          path: "recipe",
          message: `does not reproduce the submitted series (first difference: ${firstDifference(result, given)}); a pathway it names may have been edited meanwhile`,
        },
      ],
      "The recipe does not match the series.",
    );
  return { recipe, summary: describeRecipe(recipe, (id) => byId.get(id)?.name ?? id) };
}
