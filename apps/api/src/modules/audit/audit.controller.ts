import type { Request, Response } from "express";
import { contextOf } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { auditInputs as input } from "./audit.inputs.js";
import { listAudit, writeAuditCsv } from "./audit.service.js";

export const auditController = {
  async list(req: Request, res: Response) {
    res.json(await listAudit(contextOf(req), validated(res, input.list).query));
  },
  /** The filtered trail as a CSV download; the day in the file name is the UTC day it was made. */
  async csv(req: Request, res: Response) {
    const query = validated(res, input.list).query;
    res.setHeader("Content-Type", "text/csv; charset=utf-8");
    res.setHeader("Content-Disposition", `attachment; filename="plumeline-audit-${new Date().toISOString().slice(0, 10)}.csv"`);
    await writeAuditCsv(contextOf(req), query, (chunk) => res.write(chunk));
    res.end();
  },
};
