import type { Request, Response } from "express";
import { contextOf } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { outboxInputs as input } from "./outbox.inputs.js";
import { getOutboxMessage, listOutbox } from "./outbox.service.js";

export const outboxController = {
  async list(req: Request, res: Response) {
    res.json(await listOutbox(contextOf(req)));
  },
  async show(req: Request, res: Response) {
    res.json(await getOutboxMessage(contextOf(req), validated(res, input.show).params.id));
  },
};
