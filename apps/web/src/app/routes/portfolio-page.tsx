import { useParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingState } from "@/components/ui/states";
import { formatDateTime } from "@/lib/format";
import { usePortfolio } from "@/features/peril/api/get-portfolio";
import { PerilRecordError } from "@/features/peril/components/peril-record-error";
import { PortfolioRowsTable } from "@/features/peril/components/portfolio-rows-table";

/** One portfolio baseline: its rows and where they came from (file, checksum, who, when). */
export default function PortfolioPage() {
  const { portfolioId } = useParams();
  const portfolio = usePortfolio(portfolioId);
  if (portfolio.isPending) return <LoadingState label="Loading portfolio…" />;
  if (portfolio.isError) return <PerilRecordError noun="portfolio" error={portfolio.error} retry={() => portfolio.refetch()} />;
  const p = portfolio.data;
  return (
    <>
      <PageHeader
        kicker="Peril lens · portfolio"
        title={p.name}
        description={p.description || undefined}
        actions={
          <ButtonLink to={paths.perils.build()} variant="secondary">
            Back to the peril lens
          </ButtonLink>
        }
      />
      <Card>
        <CardHeader
          title={`${p.rowCount} rows`}
          subtitle={
            <>
              From {p.fileName}, uploaded by {p.createdByName ?? "unknown"} on {formatDateTime(p.createdAt)} · checksum{" "}
              <span className="font-mono text-xs">{p.checksum}</span>
            </>
          }
        />
        <PortfolioRowsTable rows={p.rows} caption={`Rows of ${p.name}`} />
      </Card>
    </>
  );
}
