import type { ResultTable } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { exportTableCsv, exportWorkbook, listExports, type ExportFile } from "./exports.service.js";

function send(res: Response, file: ExportFile) {
  res.setHeader("Content-Type", file.contentType);
  res.setHeader("Content-Disposition", `attachment; filename="${file.fileName}"`);
  res.send(file.bytes);
}

export const exportsController = {
  async csv(req: Request, res: Response) {
    const { id, table } = req.params as { id: string; table: ResultTable };
    send(res, await exportTableCsv(contextOf(req), currentUser(req), id, table));
  },
  async workbook(req: Request, res: Response) {
    send(res, await exportWorkbook(contextOf(req), currentUser(req), (req.params as { id: string }).id));
  },
  async list(req: Request, res: Response) {
    res.json(await listExports(contextOf(req), currentUser(req), req.query));
  },
};
