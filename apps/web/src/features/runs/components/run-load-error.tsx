import { paths } from "@/config/paths";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState } from "@/components/ui/states";
import { isApiError } from "@/lib/api-error";

/**
 * What the run page shows when its run cannot be read. An unknown id (404) is a dead link, not a
 * failure that trying again would fix, so it reads as "no run here" with the way back to the runs
 * list; anything else keeps the server's reason and a retry. The header keeps the way back either way.
 */
export function RunLoadError({ error, retry }: { error: unknown; retry: () => void }) {
  const missing = isApiError(error) && error.status === 404;
  return (
    <>
      <PageHeader
        kicker="Run"
        title={missing ? "No run here" : "The run could not be loaded"}
        actions={
          <ButtonLink to={paths.runs.build()} variant="secondary">
            Back to runs
          </ButtonLink>
        }
      />
      {missing ? (
        <EmptyState title="There is no run at this address">
          It may have been mistyped, or the link is from another installation. The runs list shows every run you can open.
        </EmptyState>
      ) : (
        <ErrorState error={error} retry={retry} />
      )}
    </>
  );
}
