import type { AuditQuery } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf } from "../../middleware/request-context.js";
import { listAudit, writeAuditCsv } from "./audit.service.js";

export const auditController = {
  async list(req: Request, res: Response) {
    res.json(await listAudit(contextOf(req), req.query as unknown as AuditQuery));
  },
  /** The filtered trail as a CSV download; the day in the file name is the UTC day it was made. */
  async csv(req: Request, res: Response) {
    res.setHeader("Content-Type", "text/csv; charset=utf-8");
    res.setHeader("Content-Disposition", `attachment; filename="plumeline-audit-${new Date().toISOString().slice(0, 10)}.csv"`);
    await writeAuditCsv(contextOf(req), req.query as unknown as AuditQuery, (chunk) => res.write(chunk));
    res.end();
  },
};
