import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { runStatementsController as c } from "./run-statements.controller.js";
import { runStatementsInputs as input } from "./run-statements.inputs.js";

/** Reliance and limitation statements of a run, mounted under /runs. */
export const runStatementsRouter: Router = Router();
runStatementsRouter.get("/:id/statements", authenticate, requirePermission("runs:read"), validate(input.list), c.list);
runStatementsRouter.post("/:id/statements", authenticate, requirePermission("runs:create"), validate(input.create), c.create);
