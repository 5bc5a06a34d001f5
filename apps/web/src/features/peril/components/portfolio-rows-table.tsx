import type { PortfolioRow } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { formatInteger } from "@/lib/format";

/** A portfolio's rows as uploaded: region, peril, currency and the three baseline figures. */
export function PortfolioRowsTable({ rows, caption }: { rows: PortfolioRow[]; caption: string }) {
  return (
    <Table aria-label={caption}>
      <thead>
        <tr>
          <Th>Region</Th>
          <Th>Peril</Th>
          <Th>Currency</Th>
          <Th numeric>Average annual loss</Th>
          <Th numeric>1-in-100 loss</Th>
          <Th numeric>1-in-200 loss</Th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={`${r.region}-${r.peril}`}>
            <Td>{r.region}</Td>
            <Td>{r.peril}</Td>
            <Td>{r.currency}</Td>
            <Td numeric>{formatInteger(r.aal)}</Td>
            <Td numeric>{formatInteger(r.loss100)}</Td>
            <Td numeric>{formatInteger(r.loss200)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
