import { useState } from "react";
import { Link } from "react-router-dom";
import { MEMBER_SHEET_MAX_MEMBERS, MEMBER_TABLE, RESULT_TABLES } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { buttonClass } from "@/components/ui/button";
import { ExploratoryStamp } from "@/components/ui/badges";
import { reportUrl, tableCsvUrl, tablesZipUrl, workbookUrl } from "../api/export-urls";

/**
 * One-click workbook (manifest sheet first) and a CSV per table. Each download is recorded
 * by the server; `onExported` lets the page refresh the exports list afterwards.
 */
export function ExportPanel({
  runId,
  exploratory,
  canWorkbook,
  hasPerils,
  onExported,
}: {
  runId: string;
  exploratory: boolean;
  canWorkbook: boolean;
  /** Peril tables are offered only when the run applied the peril lens. */
  hasPerils: boolean;
  onExported?: () => void;
}) {
  // A download gives no sign inside the page (the browser may save it silently), so the panel
  // says which file was asked for and where its record with the checksum will be.
  const [requested, setRequested] = useState<string>();
  const later = (file: string) => {
    setRequested(file);
    window.setTimeout(() => onExported?.(), 1500);
  };
  return (
    <div className="flex flex-col gap-3 text-sm">
      {exploratory && (
        <p className="flex items-center gap-2 text-ember-800">
          <ExploratoryStamp size="sm" /> Exports of this run are marked exploratory on every sheet and report page.
        </p>
      )}
      {canWorkbook ? (
        <div className="flex flex-wrap gap-2">
          <a href={reportUrl(runId)} download className={buttonClass("primary", "md")} onClick={() => later("Report (PDF)")}>
            <DownloadIcon />
            Report (PDF)
          </a>
          <a href={workbookUrl(runId)} download className={buttonClass("secondary", "md")} onClick={() => later("Workbook (.xlsx)")}>
            <DownloadIcon />
            Workbook (.xlsx)
          </a>
        </div>
      ) : (
        <p className="text-xs text-faint">Workbooks need the analyst, actuary or manager role.</p>
      )}
      <div>
        <p className="mb-1 text-xs font-medium uppercase tracking-wider text-muted">CSV tables</p>
        <p className="mb-1.5 text-xs text-muted">Each file is named by run, engine version and result hash; the zip adds a manifest beside the tables.</p>
        <div className="flex flex-wrap gap-1.5">
          <a href={tablesZipUrl(runId)} download className={buttonClass("secondary", "sm")} onClick={() => later("All tables (.zip)")}>
            All tables + manifest (.zip)
          </a>
          {RESULT_TABLES.filter((t) => hasPerils || !(t.startsWith("peril") || t === "portfolio-totals")).map((t) => (
            <a key={t} href={tableCsvUrl(runId, t)} download className={buttonClass("secondary", "sm")} onClick={() => later(`${t}.csv`)}>
              {t}.csv
            </a>
          ))}
        </div>
      </div>
      <div>
        <p className="mb-1 text-xs font-medium uppercase tracking-wider text-muted">Member table (for validators)</p>
        <a href={tableCsvUrl(runId, MEMBER_TABLE)} download className={buttonClass("secondary", "sm", "self-start")} onClick={() => later(`${MEMBER_TABLE}.csv`)}>
          {MEMBER_TABLE}.csv
        </a>
        <p className="mt-1 text-xs text-muted">
          One row per member: each uncertain input, the weight, and the warming at every horizon, from which every percentile above can be
          recomputed. Recomputed from the stored spec and served only when it gives back the run's result hash. The workbook carries it on a
          Members sheet up to {MEMBER_SHEET_MAX_MEMBERS.toLocaleString("en-GB")} members; larger runs have it in this CSV only.
        </p>
      </div>
      {requested && (
        <p role="status" className="text-xs text-muted">
          {requested} requested: your browser saves it. Every download is recorded with its checksum on{" "}
          <Link to={paths.exports.build()} className="font-medium text-accent hover:underline">
            Exports
          </Link>
          .
        </p>
      )}
    </div>
  );
}

function DownloadIcon() {
  return (
    <svg aria-hidden viewBox="0 0 16 16" className="h-4 w-4" fill="none" stroke="currentColor" strokeWidth="1.6">
      <path d="M8 2v8M4.5 6.5 8 10l3.5-3.5M3 13h10" />
    </svg>
  );
}
