import type { Request, Response } from "express";
import { contextOf } from "../../middleware/request-context.js";
import { getOutboxMessage, listOutbox } from "./outbox.service.js";

export const outboxController = {
  async list(req: Request, res: Response) {
    res.json(await listOutbox(contextOf(req)));
  },
  async show(req: Request, res: Response) {
    const { id } = req.params as unknown as { id: number };
    res.json(await getOutboxMessage(contextOf(req), id));
  },
};
