import type { ResultTable } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { downloadExportAgain, exportReport, exportTableCsv, exportTablesZip, exportWorkbook, listExports, type ExportFile } from "./exports.service.js";

function send(res: Response, file: ExportFile) {
  res.setHeader("Content-Type", file.contentType);
  res.setHeader("Content-Disposition", `attachment; filename="${file.fileName}"`);
  res.send(file.bytes);
}

const runId = (req: Request) => (req.params as { id: string }).id;

export const exportsController = {
  async csv(req: Request, res: Response) {
    const { id, table } = req.params as { id: string; table: ResultTable };
    send(res, await exportTableCsv(contextOf(req), currentUser(req), id, table));
  },
  async tablesZip(req: Request, res: Response) {
    send(res, await exportTablesZip(contextOf(req), currentUser(req), runId(req)));
  },
  async workbook(req: Request, res: Response) {
    send(res, await exportWorkbook(contextOf(req), currentUser(req), runId(req)));
  },
  async report(req: Request, res: Response) {
    send(res, await exportReport(contextOf(req), currentUser(req), runId(req)));
  },
  async again(req: Request, res: Response) {
    send(res, await downloadExportAgain(contextOf(req), currentUser(req), (req.params as { exportId: string }).exportId));
  },
  async list(req: Request, res: Response) {
    res.json(await listExports(contextOf(req), currentUser(req), req.query as { mine?: "true" | "false"; runId?: string }));
  },
};
