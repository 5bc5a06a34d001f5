import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { resultsController } from "./results.controller.js";
import { resultsInputs as input } from "./results.inputs.js";

/** Mounted under /runs next to the runs router. */
export const resultsRouter: Router = Router();

resultsRouter.get("/:id/result", authenticate, requirePermission("runs:read"), validate(input.byRun), resultsController.result);
