import { Link } from "react-router-dom";
import { paths } from "@/config/paths";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Cautions } from "@/components/ui/cautions";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDate } from "@/lib/format";
import { usePerilProfiles } from "../api/get-peril-profiles";
import { usePortfolios } from "../api/get-portfolios";
import { PerilProfilesTable } from "../components/peril-profiles-table";
import type { PerilViewer } from "./viewer";

/** Peril profiles and portfolio baselines (the peril lens), with the way in to the editors. */
export function PerilLensRoute({ viewer }: { viewer: PerilViewer }) {
  const profiles = usePerilProfiles();
  const portfolios = usePortfolios();
  return (
    <>
      <PageHeader
        kicker="Peril lens"
        title="Peril profiles and portfolios"
        description="How each peril scales with warming beyond what the firm's baseline view already holds, and the baseline figures it is applied to."
        actions={
          viewer.canWrite && (
            <>
              <ButtonLink to={paths.portfolioUpload.build()} variant="secondary">
                Upload portfolio
              </ButtonLink>
              <ButtonLink to={paths.perilProfileNew.build()} variant="primary">
                New profile
              </ButtonLink>
            </>
          )
        }
      />
      <Cautions className="mb-6" />
      <div className="flex flex-col gap-6">
        <Card>
          <CardHeader title="Peril profiles" subtitle="A locked profile is used by a run or an approved model version; copy it to change it." />
          {profiles.isPending ? (
            <LoadingState />
          ) : profiles.isError ? (
            <div className="p-4">
              <ErrorState error={profiles.error} />
            </div>
          ) : profiles.data.length === 0 ? (
            <div className="p-4">
              <EmptyState title="No peril profiles yet" />
            </div>
          ) : (
            <PerilProfilesTable profiles={profiles.data} />
          )}
        </Card>
        <Card>
          <CardHeader title="Portfolio baselines" />
          {portfolios.isPending ? (
            <LoadingState />
          ) : portfolios.isError ? (
            <div className="p-4">
              <ErrorState error={portfolios.error} />
            </div>
          ) : portfolios.data.length === 0 ? (
            <div className="p-4">
              <EmptyState title="No portfolios yet" />
            </div>
          ) : (
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
                {portfolios.data.map((p) => (
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
          )}
        </Card>
      </div>
    </>
  );
}
