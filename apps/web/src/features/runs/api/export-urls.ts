import type { ResultTable } from "@plumeline/contracts";
import { buildUrl } from "@/lib/api-client";

/** Download addresses; the browser sends the session cookie, the server records each export. */
export const tableCsvUrl = (runId: string, table: ResultTable | string) =>
  buildUrl(`/api/runs/${encodeURIComponent(runId)}/tables/${encodeURIComponent(table)}.csv`);

export const workbookUrl = (runId: string) => buildUrl(`/api/runs/${encodeURIComponent(runId)}/workbook.xlsx`);

export const reportUrl = (runId: string) => buildUrl(`/api/runs/${encodeURIComponent(runId)}/report.pdf`);

export const tablesZipUrl = (runId: string) => buildUrl(`/api/runs/${encodeURIComponent(runId)}/tables.zip`);
