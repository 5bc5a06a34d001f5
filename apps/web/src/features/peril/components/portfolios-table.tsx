import { Link } from "react-router-dom";
import type { PortfolioSummary } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDate } from "@/lib/format";

/** The portfolio baselines on file: what each covers and its checksum, linking to its rows. */
export function PortfoliosTable({ portfolios }: { portfolios: PortfolioSummary[] }) {
  return (
    <Table aria-label="Portfolio baselines">
      <thead>
        <tr>
          <Th>Portfolio</Th>
          <Th numeric>Rows</Th>
          <Th>Regions</Th>
          <Th>Perils</Th>
          <Th>Currencies</Th>
          <Th>Checksum</Th>
          <Th>Added</Th>
        </tr>
      </thead>
      <tbody>
        {portfolios.map((p) => (
          <tr key={p.id}>
            <Td className="font-medium">
              <Link to={paths.portfolio.build(p.id)} className="text-accent hover:underline">
                {p.name}
              </Link>
            </Td>
            <Td numeric>{p.rowCount}</Td>
            <Td className="text-xs">{p.regions.join(", ")}</Td>
            <Td className="text-xs">{p.perils.join(", ")}</Td>
            <Td className="text-xs">{p.currencies.join(", ")}</Td>
            <Td className="font-mono text-xs text-muted">{p.checksum.slice(0, 12)}…</Td>
            <Td className="text-muted">{formatDate(p.createdAt)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
