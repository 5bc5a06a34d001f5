import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { exportsInputs as input } from "./exports.inputs.js";
import { createHash } from "node:crypto";
import {
  downloadExportAgain,
  exportReport,
  exportTableCsv,
  exportTablesZip,
  exportWorkbook,
  listExports,
  openMemberTableCsv,
  type ExportFile,
} from "./exports.service.js";

function send(res: Response, file: ExportFile) {
  res.setHeader("Content-Type", file.contentType);
  res.setHeader("Content-Disposition", `attachment; filename="${file.fileName}"`);
  res.send(file.bytes);
}

const runId = (res: Response) => validated(res, input.byRun).params.id;

export const exportsController = {
  async csv(req: Request, res: Response) {
    const { id, table } = validated(res, input.table).params;
    send(res, await exportTableCsv(contextOf(req), currentUser(req), id, table));
  },
  /**
   * Streams the member table chunk by chunk at the client's pace (a large run's CSV never sits
   * in memory whole), then records the export with the checksum of what went out. A client
   * that goes away stops the recomputation thread; nothing is recorded then.
   */
  async membersCsv(req: Request, res: Response) {
    const download = await openMemberTableCsv(contextOf(req), currentUser(req), runId(res));
    const hash = createHash("sha256");
    let byteSize = 0;
    try {
      res.setHeader("Content-Type", download.contentType);
      res.setHeader("Content-Disposition", `attachment; filename="${download.fileName}"`);
      for await (const chunk of download.table.chunks()) {
        if (res.destroyed) return;
        hash.update(chunk);
        byteSize += chunk.length;
        if (!res.write(chunk)) await new Promise<void>((resolve) => (res.once("drain", resolve), res.once("close", resolve)));
      }
      if (res.destroyed) return;
      await download.record(hash.digest("hex"), byteSize);
      res.end();
    } catch (error) {
      if (!res.headersSent) throw error;
      res.destroy(error instanceof Error ? error : new Error(String(error)));
    } finally {
      await download.table.close();
    }
  },
  async tablesZip(req: Request, res: Response) {
    send(res, await exportTablesZip(contextOf(req), currentUser(req), runId(res)));
  },
  async workbook(req: Request, res: Response) {
    send(res, await exportWorkbook(contextOf(req), currentUser(req), runId(res)));
  },
  async report(req: Request, res: Response) {
    send(res, await exportReport(contextOf(req), currentUser(req), runId(res)));
  },
  async again(req: Request, res: Response) {
    send(res, await downloadExportAgain(contextOf(req), currentUser(req), validated(res, input.again).params.exportId));
  },
  async list(req: Request, res: Response) {
    res.json(await listExports(contextOf(req), currentUser(req), validated(res, input.list).query));
  },
};
