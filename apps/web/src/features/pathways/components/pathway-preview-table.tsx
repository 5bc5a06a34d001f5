import type { PathwayPreview } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { formatFixed } from "@/lib/format";

/**
 * The first rows of an uploaded file as the server read them: the year, then each column's
 * value to 3 decimals (a value that rounds to zero reads 0.000, never -0.000).
 */
export function PathwayPreviewTable({ rows }: { rows: PathwayPreview["rows"] }) {
  return (
    <Table>
      <caption className="sr-only">First rows of the file as read by the server</caption>
      <thead>
        <tr>
          {Object.keys(rows[0] ?? {}).map((k) => (
            <Th key={k} numeric={k !== "year"} className="normal-case tracking-normal">
              {k}
            </Th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row, i) => (
          <tr key={i}>
            {Object.entries(row).map(([k, v]) => (
              <Td key={k} numeric className={k === "year" ? "text-left" : undefined}>
                {k === "year" ? v : formatFixed(v, 3)}
              </Td>
            ))}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
