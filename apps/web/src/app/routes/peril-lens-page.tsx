import type { ReactNode } from "react";
import type { UseQueryResult } from "@tanstack/react-query";
import { paths } from "@/config/paths";
import { PERMISSION_HOLDERS } from "@/config/permissions";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
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

/** Peril profiles and portfolio baselines (the peril lens), with the way in to the editors. */
export function PerilLens({ viewer }: { viewer: PerilViewer }) {
  const profiles = usePerilProfiles();
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
          <ListBody
            query={profiles}
            noun="peril profiles"
            empty={
              <EmptyState
                title="No peril profiles yet"
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
          </ListBody>
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
