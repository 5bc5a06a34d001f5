import { Link } from "react-router-dom";
import type { ExportRecord } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { ApprovedSeal, ExploratoryStamp } from "@/components/ui/badges";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDateTime } from "@/lib/format";
import { ExportActions } from "./export-actions";

const kb = (bytes: number) => (bytes < 1024 ? `${bytes} B` : `${(bytes / 1024).toFixed(1)} kB`);

/** Every file handed out: which run, which table, exploratory or not, and the checksum of the bytes. */
export function ExportsTable({ exports, compact = false, canDownload = false }: { exports: ExportRecord[]; compact?: boolean; canDownload?: boolean }) {
  return (
    <Table>
      <thead>
        <tr>
          <Th>File</Th>
          <Th>Run</Th>
          {!compact && <Th>By</Th>}
          <Th>When</Th>
          {!compact && <Th numeric>Size</Th>}
          {!compact && <Th>Checksum (SHA-256)</Th>}
          {!compact && <Th>Actions</Th>}
        </tr>
      </thead>
      <tbody>
        {exports.map((e) => (
          <tr key={e.id}>
            <Td>
              <span className="font-medium">{e.fileName}</span>
              <div className="mt-0.5">{e.exploratory ? <ExploratoryStamp size="sm" /> : <ApprovedSeal size="sm" />}</div>
            </Td>
            <Td>
              <Link to={paths.run.build(e.runId)} className="text-accent hover:underline">
                {e.runName ?? e.runId.slice(0, 8)}
              </Link>
            </Td>
            {!compact && <Td>{e.createdByName ?? "–"}</Td>}
            <Td className="whitespace-nowrap text-muted">{formatDateTime(e.createdAt)}</Td>
            {!compact && <Td numeric>{kb(e.byteSize)}</Td>}
            {!compact && (
              <Td>
                <code className="num block max-w-48 truncate text-[11px] text-muted" title={e.checksum}>
                  {e.checksum}
                </code>
              </Td>
            )}
            {!compact && (
              <Td>
                <ExportActions record={e} canDownload={canDownload} />
              </Td>
            )}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
