import type { ReactNode } from "react";
import type { UseQueryResult } from "@tanstack/react-query";
import { paths } from "@/config/paths";
import { PERMISSION_HOLDERS } from "@/config/permissions";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { ListControls } from "@/components/lists/list-controls";
import { listFieldErrors } from "@/components/lists/list-field-errors";
import { PagedList } from "@/components/lists/paged-list";
import { useListQuery } from "@/components/lists/use-list-query";
import { Cautions } from "@/components/ui/cautions";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";
import { usePerilProfiles } from "@/features/peril/api/get-peril-profiles";
import { usePortfolios } from "@/features/peril/api/get-portfolios";
import { PerilProfilesTable } from "@/features/peril/components/peril-profiles-table";
import { PortfoliosTable } from "@/features/peril/components/portfolios-table";
import type { PerilViewer } from "@/features/peril/lib/peril-viewer";
import { usePerilViewer } from "../use-peril-viewer";

/**
 * One card's list in its four states. The loading and error texts name the list, because the
 * two cards load independently and a bare "Loading…" or "Something went wrong" would not say
 * which of them is meant.
 */
function ListBody<T>({
  query,
  noun,
  empty,
  children,
}: {
  query: UseQueryResult<T[]>;
  noun: string;
  empty: ReactNode;
  children: (rows: T[]) => ReactNode;
}) {
  if (query.isPending) return <LoadingState label={`Loading ${noun}…`} />;
  if (query.isError)
    return (
      <div className="p-4">
        <ErrorState error={query.error} title={`The ${noun} could not be loaded`} retry={() => query.refetch()} />
      </div>
    );
  if (query.data.length === 0) return <div className="p-4">{empty}</div>;
  return <>{children(query.data)}</>;
}

const PROFILE_SORTS = [
  { value: "peril:asc", label: "Peril, region, name" },
  { value: "region:asc", label: "Region, peril, name" },
  { value: "name:asc", label: "Name A–Z" },
  { value: "name:desc", label: "Name Z–A" },
  { value: "updatedAt:desc", label: "Recently changed" },
  { value: "createdAt:desc", label: "Newest first" },
  { value: "createdAt:asc", label: "Oldest first" },
];

/** Peril profiles and portfolio baselines (the peril lens), with the way in to the editors. */
export function PerilLens({ viewer }: { viewer: PerilViewer }) {
  const list = useListQuery({ defaultSort: "peril:asc", filterKeys: ["metric", "author", "from", "to"] });
  const { q, sort, limit, offset, filters } = list.state;
  const profiles = usePerilProfiles({ q, sort, limit, offset, metric: (filters.metric || undefined) as "frequency" | "severity" | undefined, author: filters.author, from: filters.from, to: filters.to });
  const portfolios = usePortfolios();
  // Read-only roles cannot fill an empty list themselves; say who can instead of offering a button.
  const whoAdds = `Only ${PERMISSION_HOLDERS["perils:write"]} can add them.`;
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
          <CardBody>
            <ListControls
              noun="peril profiles"
              state={list.state}
              onChange={list.update}
              errors={listFieldErrors(profiles.error)}
              searchHint="Name, peril, region or source"
              sortOptions={PROFILE_SORTS}
              selects={[{ key: "metric", label: "Metric", options: [{ value: "frequency", label: "frequency" }, { value: "severity", label: "severity" }] }]}
              texts={[{ key: "author", label: "Written by", placeholder: "Name or email" }]}
              dates
            />
          </CardBody>
          <PagedList
            result={profiles}
            noun="peril profiles"
            state={list.state}
            onOffset={list.setOffset}
            empty={
              <EmptyState
                title={list.filtered ? "No peril profiles match these filters" : "No peril profiles yet"}
                action={
                  viewer.canWrite && (
                    <ButtonLink to={paths.perilProfileNew.build()} variant="secondary">
                      Write the first profile
                    </ButtonLink>
                  )
                }
              >
                A profile says how one peril in one region scales with warming (a rate per kelvin or a table). Runs apply the chosen profiles to
                their warming percentiles. {viewer.canWrite ? "" : whoAdds}
              </EmptyState>
            }
          >
            {(rows) => <PerilProfilesTable profiles={rows} />}
          </PagedList>
        </Card>
        <Card>
          <CardHeader title="Portfolio baselines" />
          <ListBody
            query={portfolios}
            noun="portfolio baselines"
            empty={
              <EmptyState
                title="No portfolios yet"
                action={
                  viewer.canWrite && (
                    <ButtonLink to={paths.portfolioUpload.build()} variant="secondary">
                      Upload a portfolio
                    </ButtonLink>
                  )
                }
              >
                A portfolio baseline holds the firm's own AAL and 1-in-100 and 1-in-200 losses per region and peril (CSV or XLSX). Without one, a run
                shows multipliers and return periods but no projected losses. {viewer.canWrite ? "" : whoAdds}
              </EmptyState>
            }
          >
            {(rows) => <PortfoliosTable portfolios={rows} />}
          </ListBody>
        </Card>
      </div>
    </>
  );
}

/** Peril profiles and portfolio baselines for the signed-in person. */
export default function PerilLensPage() {
  return <PerilLens viewer={usePerilViewer()} />;
}
