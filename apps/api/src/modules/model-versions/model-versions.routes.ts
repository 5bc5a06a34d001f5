import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { modelVersionsController as c } from "./model-versions.controller.js";
import { modelVersionsInputs as input } from "./model-versions.inputs.js";

export const modelVersionsRouter: Router = Router();

modelVersionsRouter.get("/", authenticate, requirePermission("model-versions:read"), validate(input.list), c.list);
modelVersionsRouter.get("/:id", authenticate, requirePermission("model-versions:read"), validate(input.byId), c.get);
modelVersionsRouter.get("/:id/diff", authenticate, requirePermission("model-versions:read"), validate(input.diff), c.diff);
// Read-only preview: runs two small ensembles in an engine thread (no audit; nothing is stored).
modelVersionsRouter.post("/:id/impact", authenticate, requirePermission("model-versions:read"), validate(input.impact), c.impact);
modelVersionsRouter.post("/", authenticate, requirePermission("model-versions:write"), validate(input.create), c.create);
modelVersionsRouter.patch("/:id", authenticate, requirePermission("model-versions:write"), validate(input.update), c.update);
modelVersionsRouter.post("/:id/submit", authenticate, requirePermission("model-versions:write"), validate(input.submit), c.submit);
modelVersionsRouter.post("/:id/approve", authenticate, requirePermission("model-versions:decide"), validate(input.decide), c.approve);
modelVersionsRouter.post("/:id/reject", authenticate, requirePermission("model-versions:decide"), validate(input.decide), c.reject);
modelVersionsRouter.post("/:id/retire", authenticate, requirePermission("model-versions:decide"), validate(input.retire), c.retire);
