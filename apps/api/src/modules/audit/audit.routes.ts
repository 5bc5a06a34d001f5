import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { auditController } from "./audit.controller.js";
import { auditInputs as input } from "./audit.inputs.js";

export const auditRouter = Router();

auditRouter.get("/", authenticate, requirePermission("audit:read"), validate(input.list), auditController.list);

/** Mounted at /audit.csv: the same filters as the list, the whole trail as one file. */
export const auditCsvRouter = Router();

auditCsvRouter.get("/", authenticate, requirePermission("audit:read"), validate(input.list), auditController.csv);
