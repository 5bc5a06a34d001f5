import { useState } from "react";
import type { ExportRecord } from "@plumeline/contracts";
import { isApiError } from "@/lib/api-error";
import { downloadExportAgain } from "../api/download-export-again";

/**
 * Per register row: download the file again (rebuilt by the server and checked against the
 * recorded checksum; a refusal is shown here in words) and copy the checksum in one click.
 */
export function ExportActions({ record, canDownload }: { record: ExportRecord; canDownload: boolean }) {
  const [state, setState] = useState<{ kind: "idle" | "busy" | "done" } | { kind: "error"; message: string }>({ kind: "idle" });
  const [copied, setCopied] = useState(false);
  const again = async () => {
    setState({ kind: "busy" });
    try {
      await downloadExportAgain(record.id, record.fileName);
      setState({ kind: "done" });
    } catch (e) {
      setState({ kind: "error", message: isApiError(e) ? e.message : "The export could not be downloaded again." });
    }
  };
  const copy = async () => {
    await navigator.clipboard.writeText(record.checksum);
    setCopied(true);
    window.setTimeout(() => setCopied(false), 2000);
  };
  return (
    <div className="flex flex-col items-start gap-1">
      <div className="flex gap-1.5">
        {canDownload && (
          <button type="button" onClick={again} disabled={state.kind === "busy"} className="rounded border border-line px-2 py-0.5 text-xs hover:bg-surface-2" aria-label={`Download ${record.fileName} again`}>
            {state.kind === "busy" ? "Checking…" : "Download again"}
          </button>
        )}
        <button type="button" onClick={copy} className="rounded border border-line px-2 py-0.5 text-xs hover:bg-surface-2" aria-label={`Copy the checksum of ${record.fileName}`}>
          {copied ? "Copied" : "Copy checksum"}
        </button>
      </div>
      {state.kind === "done" && <p role="status" className="text-[11px] text-ok">Rebuilt and checked: same SHA-256 as recorded.</p>}
      {state.kind === "error" && (
        <p role="alert" className="max-w-72 text-[11px] text-danger">
          {state.message}
        </p>
      )}
    </div>
  );
}
