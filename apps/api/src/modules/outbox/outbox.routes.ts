import { Router } from "express";
import { authenticate } from "../../middleware/authenticate.js";
import { requirePermission } from "../../middleware/require-permission.js";
import { validate } from "../../middleware/validate.js";
import { outboxController } from "./outbox.controller.js";
import { outboxInputs as input } from "./outbox.inputs.js";

export const outboxRouter = Router();

outboxRouter.get("/", authenticate, requirePermission("outbox:read"), outboxController.list);
outboxRouter.get("/:id", authenticate, requirePermission("outbox:read"), validate(input.show), outboxController.show);
