import { listExportsQuerySchema, RESULT_TABLES } from "@plumeline/contracts";
import { Router } from "express";
import { z } from "zod";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { exportsController as c } from "./exports.controller.js";

const tableParams = z.object({
  id: z.string().min(1),
  table: z.enum(RESULT_TABLES, { error: `must be one of ${RESULT_TABLES.join(", ")}` }),
});

/** File downloads of a run, mounted under /runs (each one is recorded as an export). */
export const runExportsRouter: Router = Router();
// Registered before the result tables: "members" is not a result table but the recomputed member table.
runExportsRouter.get("/:id/tables/members.csv", authenticate, requirePermission("runs:read"), validate({ params: z.object({ id: z.string().min(1) }) }), c.membersCsv);
runExportsRouter.get("/:id/tables/:table.csv", authenticate, requirePermission("runs:read"), validate({ params: tableParams }), c.csv);
runExportsRouter.get("/:id/tables.zip", authenticate, requirePermission("runs:read"), validate({ params: z.object({ id: z.string().min(1) }) }), c.tablesZip);
runExportsRouter.get("/:id/report.pdf", authenticate, requirePermission("exports:create"), validate({ params: z.object({ id: z.string().min(1) }) }), c.report);
runExportsRouter.get("/:id/workbook.xlsx", authenticate, requirePermission("exports:create"), validate({ params: z.object({ id: z.string().min(1) }) }), c.workbook);

/** The export register, mounted at /exports. */
export const exportsRouter: Router = Router();
exportsRouter.get("/", authenticate, requirePermission("runs:read"), validate({ query: listExportsQuerySchema }), c.list);
exportsRouter.get("/:exportId/file", authenticate, requirePermission("exports:create"), validate({ params: z.object({ exportId: z.string().min(1) }) }), c.again);
