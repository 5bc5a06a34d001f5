import {
  copyPerilProfileBodySchema,
  curveRangeSchema,
  listPerilProfilesQuerySchema,
  perilCurvePreviewBodySchema,
  perilProfileBodySchema,
  updatePerilProfileBodySchema,
} from "@plumeline/contracts";
import { Router } from "express";
import { z } from "zod";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { perilProfilesController as c } from "./peril-profiles.controller.js";

const params = z.object({ id: z.string().min(1) });

export const perilProfilesRouter: Router = Router();

perilProfilesRouter.get("/", authenticate, requirePermission("perils:read"), validate({ query: listPerilProfilesQuerySchema }), c.list);
perilProfilesRouter.post("/", authenticate, requirePermission("perils:write"), validate({ body: perilProfileBodySchema }), c.create);
// A draft's curve saves nothing, so reading the lens is enough to ask for it.
perilProfilesRouter.post("/preview", authenticate, requirePermission("perils:read"), validate({ body: perilCurvePreviewBodySchema }), c.preview);
perilProfilesRouter.get("/:id", authenticate, requirePermission("perils:read"), validate({ params }), c.get);
perilProfilesRouter.get("/:id/curve", authenticate, requirePermission("perils:read"), validate({ params, query: curveRangeSchema }), c.curve);
perilProfilesRouter.patch(
  "/:id",
  authenticate,
  requirePermission("perils:write"),
  validate({ params, body: updatePerilProfileBodySchema }),
  c.update,
);
perilProfilesRouter.delete("/:id", authenticate, requirePermission("perils:write"), validate({ params }), c.remove);
perilProfilesRouter.post("/:id/copy", authenticate, requirePermission("perils:write"), validate({ params, body: copyPerilProfileBodySchema.optional() }), c.copy);
