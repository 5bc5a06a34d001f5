import type { Request, Response } from "express";
import { contextOf } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { auditInputs as input } from "./audit.inputs.js";
import { listAudit } from "./audit.service.js";

export const auditController = {
  async list(req: Request, res: Response) {
    res.json(await listAudit(contextOf(req), validated(res, input.list).query));
  },
};
