import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { settingsController as c } from "./settings.controller.js";
import { settingsInputs as input } from "./settings.inputs.js";

export const settingsRouter: Router = Router();

// Everyone who reads model versions may see the policy a minor change is held to; only an admin sets it.
settingsRouter.get("/materiality", authenticate, requirePermission("model-versions:read"), c.getMateriality);
settingsRouter.put("/materiality", authenticate, requirePermission("settings:manage"), validate(input.updateMateriality), c.updateMateriality);
