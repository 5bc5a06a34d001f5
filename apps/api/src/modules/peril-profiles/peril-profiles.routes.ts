import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { perilProfilesController as c } from "./peril-profiles.controller.js";
import { perilProfilesInputs as input } from "./peril-profiles.inputs.js";

export const perilProfilesRouter: Router = Router();

perilProfilesRouter.get("/", authenticate, requirePermission("perils:read"), validate(input.list), c.list);
perilProfilesRouter.post("/", authenticate, requirePermission("perils:write"), validate(input.create), c.create);
// A draft's curve saves nothing, so reading the lens is enough to ask for it.
perilProfilesRouter.post("/preview", authenticate, requirePermission("perils:read"), validate(input.preview), c.preview);
perilProfilesRouter.get("/:id", authenticate, requirePermission("perils:read"), validate(input.byId), c.get);
perilProfilesRouter.get("/:id/curve", authenticate, requirePermission("perils:read"), validate(input.curve), c.curve);
perilProfilesRouter.patch("/:id", authenticate, requirePermission("perils:write"), validate(input.update), c.update);
perilProfilesRouter.delete("/:id", authenticate, requirePermission("perils:write"), validate(input.byId), c.remove);
perilProfilesRouter.post("/:id/copy", authenticate, requirePermission("perils:write"), validate(input.copy), c.copy);
