import { portfolioRowsSchema } from "@plumeline/contracts";
import { demoPerilProfiles, demoPortfolio } from "@plumeline/seeds";
import type { AppContext } from "../context.js";
import { createPerilProfile } from "../modules/peril-profiles/peril-profiles.service.js";
import { createPortfolio } from "../modules/portfolios/portfolios.service.js";
import type { SeededUserIds } from "./seed-users.js";

/**
 * Demo peril lens on first start: the illustrative profiles (drafted by the analyst, keeping
 * their seed ids so links stay stable) and the invented insurer's portfolio baseline
 * (uploaded by the actuary, rows validated exactly as an upload is). Through the services,
 * so each appears in the audit trail.
 */
export async function seedPerils(ctx: AppContext, userIds: SeededUserIds): Promise<{ profiles: number; portfolioRows: number }> {
  for (const { id, ...profile } of demoPerilProfiles)
    await createPerilProfile(ctx, { id: userIds.analyst }, profile, { id, origin: "the demo seed (illustrative)" });
  const rows = portfolioRowsSchema.parse(demoPortfolio.rows);
  await createPortfolio(ctx, { id: userIds.actuary }, {
    id: demoPortfolio.id,
    name: demoPortfolio.name,
    description: "Illustrative figures for the invented insurer (demo seed). The hail row has no profile on purpose.",
    rows,
    fileName: "demo-portfolio.csv",
  });
  return { profiles: demoPerilProfiles.length, portfolioRows: rows.length };
}
