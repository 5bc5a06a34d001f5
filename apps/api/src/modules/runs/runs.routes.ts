import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { runsController as c } from "./runs.controller.js";
import { runsInputs as input } from "./runs.inputs.js";

export const runsRouter: Router = Router();

runsRouter.get("/", authenticate, requirePermission("runs:read"), validate(input.list), c.list);
runsRouter.post("/", authenticate, requirePermission("runs:create"), validate(input.create), c.create);
runsRouter.get("/:id", authenticate, requirePermission("runs:read"), validate(input.byId), c.get);
runsRouter.post("/:id/cancel", authenticate, requirePermission("runs:create"), validate(input.byId), c.cancel);
runsRouter.post("/:id/replay", authenticate, requirePermission("runs:create"), validate(input.byId), c.replay);
runsRouter.get("/:id/replays", authenticate, requirePermission("runs:read"), validate(input.byId), c.replays);
runsRouter.get("/:id/replays/:replayId", authenticate, requirePermission("runs:read"), validate(input.replayOne), c.replayOne);
