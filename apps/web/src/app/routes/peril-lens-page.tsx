import { usePerilProfiles } from "@/features/peril/api/get-peril-profiles";
import { usePortfolios } from "@/features/peril/api/get-portfolios";
import { PerilProfilesTable } from "@/features/peril/components/peril-profiles-table";
import { Card, CardHeader } from "@/components/ui/card";
import { Cautions } from "@/components/ui/cautions";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDate } from "@/lib/format";

/** Peril profiles and portfolio baselines (the peril lens); editors and result tabs build on this page. */
export default function PerilLensPage() {
  const profiles = usePerilProfiles();
  const portfolios = usePortfolios();
  return (
    <>
      <PageHeader
        kicker="Peril lens"
        title="Peril profiles and portfolios"
        description="How each peril scales with warming beyond what the firm's baseline view already holds, and the baseline figures it is applied to."
      />
      <Cautions className="mb-6" />
      <div className="flex flex-col gap-6">
        <Card>
          <CardHeader title="Peril profiles" />
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
            <Table>
              <thead>
                <tr>
                  <Th>Portfolio</Th>
                  <Th numeric>Rows</Th>
                  <Th>Regions</Th>
                  <Th>Perils</Th>
                  <Th>Currencies</Th>
                  <Th>Added</Th>
                </tr>
              </thead>
              <tbody>
                {portfolios.data.map((p) => (
                  <tr key={p.id}>
                    <Td className="font-medium">{p.name}</Td>
                    <Td numeric>{p.rowCount}</Td>
                    <Td className="text-xs">{p.regions.join(", ")}</Td>
                    <Td className="text-xs">{p.perils.join(", ")}</Td>
                    <Td className="text-xs">{p.currencies.join(", ")}</Td>
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
