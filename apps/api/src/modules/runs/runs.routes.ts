import { createRunBodySchema, listRunsQuerySchema } from "@plumeline/contracts";
import { Router } from "express";
import { z } from "zod";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { runsController as c } from "./runs.controller.js";

const params = z.object({ id: z.string().min(1) });

export const runsRouter: Router = Router();

runsRouter.get("/", authenticate, requirePermission("runs:read"), validate({ query: listRunsQuerySchema }), c.list);
runsRouter.post("/", authenticate, requirePermission("runs:create"), validate({ body: createRunBodySchema }), c.create);
runsRouter.get("/:id", authenticate, requirePermission("runs:read"), validate({ params }), c.get);
runsRouter.post("/:id/cancel", authenticate, requirePermission("runs:create"), validate({ params }), c.cancel);
runsRouter.post("/:id/replay", authenticate, requirePermission("runs:create"), validate({ params }), c.replay);
runsRouter.get("/:id/replays", authenticate, requirePermission("runs:read"), validate({ params }), c.replays);
runsRouter.get("/:id/replays/:replayId", authenticate, requirePermission("runs:read"), validate({ params: params.extend({ replayId: z.string().min(1) }) }), c.replayOne);
