import { createRunStatementBodySchema } from "@plumeline/contracts";
import { Router } from "express";
import { z } from "zod";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { runStatementsController as c } from "./run-statements.controller.js";

const params = z.object({ id: z.string().min(1) });

/** Reliance and limitation statements of a run, mounted under /runs. */
export const runStatementsRouter: Router = Router();
runStatementsRouter.get("/:id/statements", authenticate, requirePermission("runs:read"), validate({ params }), c.list);
runStatementsRouter.post("/:id/statements", authenticate, requirePermission("runs:create"), validate({ params, body: createRunStatementBodySchema }), c.create);
