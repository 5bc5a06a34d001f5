import { matchingRows } from "./apply-peril-lens.js";
import { planPortfolioTotals } from "./portfolio-totals.js";
import type { PathwayPerilResult, PerilProfile, PerilResult, Portfolio } from "./types.js";

/**
 * The result's `perils` block from the per-pathway lens results (applyPerilLens), in
 * pathway order, plus the portfolio rows no profile projects (same peril and region), so
 * the actuary sees what was left out. Cost O(profiles × rows).
 *
 * Example: one profile "flood"/"North Vale", rows North Vale flood and South Fen wind →
 * unmatchedRows [{ region: "South Fen", peril: "wind" }].
 */
export function assemblePerilResult(
  profiles: readonly PerilProfile[],
  portfolio: Portfolio | null,
  pathways: PathwayPerilResult[],
): PerilResult {
  const matched = new Set(profiles.flatMap((p) => matchingRows(p, portfolio)));
  const unmatchedRows = (portfolio?.rows ?? []).filter((r) => !matched.has(r)).map((r) => ({ region: r.region, peril: r.peril }));
  const result: PerilResult = { portfolioId: portfolio?.id ?? null, pathways, unmatchedRows };
  const plan = portfolio ? planPortfolioTotals(profiles, portfolio) : null;
  if (plan && "refused" in plan) result.totalsRefused = plan.refused;
  return result;
}
