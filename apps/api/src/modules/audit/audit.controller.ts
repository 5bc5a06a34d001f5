import type { AuditQuery } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf } from "../../middleware/request-context.js";
import { listAudit } from "./audit.service.js";

export const auditController = {
  async list(req: Request, res: Response) {
    res.json(await listAudit(contextOf(req), req.query as unknown as AuditQuery));
  },
};
