import type { ErrorDetail, PerilProfile, Portfolio } from "@plumeline/contracts";
import type { Transaction } from "sequelize";
import type { AppContext } from "../../context.js";
import { toEnginePortfolio } from "../portfolios/portfolios.service.js";
import { resolvePerilProfiles } from "./peril-profiles.service.js";

/** The peril part of a run spec: copies of the profiles and of the portfolio rows. */
export interface PerilSpecPart {
  perils?: PerilProfile[];
  portfolio?: Portfolio;
}

/**
 * Resolves a run request's `perilProfileIds` and `portfolioId` into the spec's `perils` and
 * `portfolio`, copied in full (not referenced), so the stored spec alone reproduces the run
 * on replay even if a profile is later copied or edited. Unknown or repeated ids come back as
 * field details naming the request field. Nothing asked for: an empty part (spec unchanged).
 */
export async function resolvePerilLens(
  ctx: Pick<AppContext, "models">,
  body: { perilProfileIds?: string[] | undefined; portfolioId?: string | null | undefined },
  transaction?: Transaction,
): Promise<{ spec: PerilSpecPart; errors: ErrorDetail[] }> {
  const ids = body.perilProfileIds ?? [];
  const errors: ErrorDetail[] = [];
  const firstIndex = new Map<string, number>();
  ids.forEach((id, i) => {
    const first = firstIndex.get(id);
    if (first !== undefined) errors.push({ path: `perilProfileIds[${i}]`, message: `repeats peril profile ${id} (already perilProfileIds[${first}])` });
    else firstIndex.set(id, i);
  });
  const resolved = await resolvePerilProfiles(ctx, ids, transaction);
  errors.push(...resolved.errors);
  const spec: PerilSpecPart = {};
  if (ids.length > 0) spec.perils = resolved.profiles;
  if (body.portfolioId) {
    const row = await ctx.models.Portfolio.findByPk(body.portfolioId, transaction ? { transaction } : {});
    if (!row) errors.push({ path: "portfolioId", message: `portfolio ${body.portfolioId} does not exist` });
    else if (ids.length === 0) errors.push({ path: "portfolioId", message: "needs at least one peril profile in perilProfileIds to be projected" });
    else spec.portfolio = toEnginePortfolio(row);
  }
  return { spec, errors };
}
