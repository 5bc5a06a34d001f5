import { paths } from "@/config/paths";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState } from "@/components/ui/states";
import { isApiError } from "@/lib/api-error";

/**
 * What a profile or portfolio page shows when its record cannot be read. An unknown id (404)
 * is a dead link rather than a failure, so it reads as a calm "nothing here" with the way back;
 * anything else keeps the server's reason and a retry. Either way the page keeps its header and
 * the link back to the peril lens, so the user is never left on a bare message.
 */
export function PerilRecordError({ noun, error, retry }: { noun: "peril profile" | "portfolio"; error: unknown; retry: () => void }) {
  const missing = isApiError(error) && error.status === 404;
  return (
    <>
      <PageHeader
        kicker={`Peril lens · ${noun === "portfolio" ? "portfolio" : "profile"}`}
        title={missing ? `No ${noun} here` : `The ${noun} could not be loaded`}
        actions={
          <ButtonLink to={paths.perils.build()} variant="secondary">
            Back to the peril lens
          </ButtonLink>
        }
      />
      {missing ? (
        <EmptyState title={`There is no ${noun} at this address`}>
          It may have been deleted, or the link is mistyped. The peril lens lists every {noun} you can open.
        </EmptyState>
      ) : (
        <ErrorState error={error} retry={retry} />
      )}
    </>
  );
}
