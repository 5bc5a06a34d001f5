import { Router } from "express";
import { z } from "zod";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { resultsController } from "./results.controller.js";

/** Mounted under /runs next to the runs router. */
export const resultsRouter: Router = Router();

resultsRouter.get("/:id/result", authenticate, requirePermission("runs:read"), validate({ params: z.object({ id: z.string().min(1) }) }), resultsController.result);
