import {
  createModelVersionBodySchema,
  decideModelVersionBodySchema,
  diffModelVersionQuerySchema,
  listModelVersionsQuerySchema,
  modelVersionImpactBodySchema,
  retireModelVersionBodySchema,
  submitModelVersionBodySchema,
  updateModelVersionBodySchema,
} from "@plumeline/contracts";
import { Router } from "express";
import { z } from "zod";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { modelVersionsController as c } from "./model-versions.controller.js";

const params = z.object({ id: z.string().min(1) });

export const modelVersionsRouter: Router = Router();

modelVersionsRouter.get("/", authenticate, requirePermission("model-versions:read"), validate({ query: listModelVersionsQuerySchema }), c.list);
modelVersionsRouter.get("/:id", authenticate, requirePermission("model-versions:read"), validate({ params }), c.get);
modelVersionsRouter.get("/:id/diff", authenticate, requirePermission("model-versions:read"), validate({ params, query: diffModelVersionQuerySchema }), c.diff);
// Read-only preview: runs two small ensembles in an engine thread (no audit; nothing is stored).
modelVersionsRouter.post("/:id/impact", authenticate, requirePermission("model-versions:read"), validate({ params, body: modelVersionImpactBodySchema }), c.impact);
modelVersionsRouter.post("/", authenticate, requirePermission("model-versions:write"), validate({ body: createModelVersionBodySchema }), c.create);
modelVersionsRouter.patch("/:id", authenticate, requirePermission("model-versions:write"), validate({ params, body: updateModelVersionBodySchema }), c.update);
modelVersionsRouter.post("/:id/submit", authenticate, requirePermission("model-versions:write"), validate({ params, body: submitModelVersionBodySchema }), c.submit);
modelVersionsRouter.post("/:id/approve", authenticate, requirePermission("model-versions:decide"), validate({ params, body: decideModelVersionBodySchema }), c.approve);
modelVersionsRouter.post("/:id/reject", authenticate, requirePermission("model-versions:decide"), validate({ params, body: decideModelVersionBodySchema }), c.reject);
modelVersionsRouter.post("/:id/retire", authenticate, requirePermission("model-versions:decide"), validate({ params, body: retireModelVersionBodySchema }), c.retire);
