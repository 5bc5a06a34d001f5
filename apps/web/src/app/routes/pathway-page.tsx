import { useParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { useCan } from "@/features/auth/use-permission";
import { usePathway } from "@/features/pathways/api/get-pathway";
import { PathwayCharts } from "@/features/pathways/components/pathway-charts";
import { ChartSourceProvider } from "@/components/charts/chart-source";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { ErrorState, LoadingState } from "@/components/ui/states";
import { formatDateTime } from "@/lib/format";

export default function PathwayPage() {
  const { pathwayId = "" } = useParams();
  const pathway = usePathway(pathwayId);
  const canWrite = useCan("pathways:write");
  if (pathway.isPending) return <LoadingState label="Loading pathway…" />;
  if (pathway.isError) return <ErrorState error={pathway.error} retry={() => pathway.refetch()} />;
  const p = pathway.data;
  return (
    <>
      <PageHeader
        kicker="Pathway"
        title={p.name}
        description={p.description || undefined}
        actions={
          canWrite && (
            <ButtonLink to={paths.pathwayCompose.build(p.id)} variant="secondary">
              Compose a variant
            </ButtonLink>
          )
        }
      />
      <Card className="mb-6">
        <CardBody>
          <dl className="grid gap-x-6 gap-y-3 text-sm sm:grid-cols-2 lg:grid-cols-4">
            <div>
              <dt className="text-muted">Source</dt>
              <dd>{p.source}</dd>
            </div>
            <div>
              <dt className="text-muted">Vintage</dt>
              <dd>{p.vintage}</dd>
            </div>
            <div>
              <dt className="text-muted">Years</dt>
              <dd className="num">
                {p.startYear}–{p.endYear}
              </dd>
            </div>
            <div>
              <dt className="text-muted">Added</dt>
              <dd>{formatDateTime(p.createdAt)}</dd>
            </div>
            <div className="sm:col-span-2 lg:col-span-4">
              <dt className="text-muted">Checksum (SHA-256 of the series)</dt>
              <dd className="num break-all text-xs">{p.checksum}</dd>
            </div>
          </dl>
          <p className="mt-3 text-xs text-muted">Inputs can be revised or withdrawn upstream: cite the vintage.</p>
        </CardBody>
      </Card>
      <Card>
        <CardBody>
          {/* A pathway has no run: its downloaded charts name the pathway, its source, vintage and checksum instead. */}
          <ChartSourceProvider source={{ lines: [`Pathway “${p.name}” · source ${p.source} · vintage ${p.vintage}`, `Pathway checksum ${p.checksum}`], fileLabel: p.name }}>
            <PathwayCharts name={p.name} startYear={p.startYear} agents={p.agents} />
          </ChartSourceProvider>
        </CardBody>
      </Card>
    </>
  );
}
