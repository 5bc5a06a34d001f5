import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { exportsController as c } from "./exports.controller.js";
import { exportsInputs as input } from "./exports.inputs.js";

/** File downloads of a run, mounted under /runs (each one is recorded as an export). */
export const runExportsRouter: Router = Router();
// Registered before the result tables: "members" is not a result table but the recomputed member table.
runExportsRouter.get("/:id/tables/members.csv", authenticate, requirePermission("runs:read"), validate(input.byRun), c.membersCsv);
runExportsRouter.get("/:id/tables/:table.csv", authenticate, requirePermission("runs:read"), validate(input.table), c.csv);
runExportsRouter.get("/:id/tables.zip", authenticate, requirePermission("runs:read"), validate(input.byRun), c.tablesZip);
runExportsRouter.get("/:id/report.pdf", authenticate, requirePermission("exports:create"), validate(input.byRun), c.report);
runExportsRouter.get("/:id/workbook.xlsx", authenticate, requirePermission("exports:create"), validate(input.byRun), c.workbook);

/** The export register, mounted at /exports. */
export const exportsRouter: Router = Router();
exportsRouter.get("/", authenticate, requirePermission("runs:read"), validate(input.list), c.list);
exportsRouter.get("/:exportId/file", authenticate, requirePermission("exports:create"), validate(input.again), c.again);
