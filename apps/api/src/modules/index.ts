import type { Router } from "express";
import { auditCsvRouter, auditRouter } from "./audit/audit.routes.js";
import { healthRouter } from "./health/health.routes.js";
import { meRouter } from "./me/me.routes.js";
import { outboxRouter } from "./outbox/outbox.routes.js";
import { usersRouter } from "./users/users.routes.js";
import { pathwaysRouter } from "./pathways/pathways.routes.js";
import { modelVersionsRouter } from "./model-versions/model-versions.routes.js";
import { runsRouter } from "./runs/runs.routes.js";
import { resultsRouter } from "./results/results.routes.js";
import { exportsRouter, runExportsRouter } from "./exports/exports.routes.js";
import { runStatementsRouter } from "./run-statements/run-statements.routes.js";
import { perilProfilesRouter } from "./peril-profiles/peril-profiles.routes.js";
import { portfoliosRouter } from "./portfolios/portfolios.routes.js";
import { settingsRouter } from "./settings/settings.routes.js";

/**
 * Every module's router and the path it is mounted at under /api. app.ts mounts them in
 * this order. Add one line per module.
 */
export const moduleRouters: ReadonlyArray<readonly [path: string, router: Router]> = [
  // foundation
  ["/health", healthRouter],
  ["/me", meRouter],
  ["/users", usersRouter],
  ["/audit", auditRouter],
  ["/audit.csv", auditCsvRouter],
  ["/outbox", outboxRouter],
  ["/settings", settingsRouter],
  // domain (pathways, model-versions, runs, results, exports)
  ["/pathways", pathwaysRouter],
  ["/model-versions", modelVersionsRouter],
  ["/runs", runsRouter],
  ["/runs", resultsRouter],
  ["/runs", runExportsRouter],
  ["/runs", runStatementsRouter],
  ["/exports", exportsRouter],
  // peril (peril-profiles, portfolios)
  ["/peril-profiles", perilProfilesRouter],
  ["/portfolios", portfoliosRouter],
];
