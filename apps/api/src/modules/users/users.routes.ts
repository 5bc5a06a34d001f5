import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { usersController } from "./users.controller.js";
import { usersInputs as input } from "./users.inputs.js";

export const usersRouter = Router();

usersRouter.get("/", authenticate, requirePermission("users:manage"), usersController.list);
usersRouter.post("/", authenticate, requirePermission("users:manage"), validate(input.invite), usersController.invite);
usersRouter.patch("/:id", authenticate, requirePermission("users:manage"), validate(input.update), usersController.update);
// Deactivation keeps the person's history; only signing in stops (user-status.service.ts).
usersRouter.post("/:id/deactivate", authenticate, requirePermission("users:manage"), validate(input.byId), usersController.deactivate);
usersRouter.post("/:id/reactivate", authenticate, requirePermission("users:manage"), validate(input.byId), usersController.reactivate);
