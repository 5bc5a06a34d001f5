import { isRouteErrorResponse, useRouteError } from "react-router-dom";
import { ErrorState } from "@/components/ui/states";

/** Route-level boundary: a failed lazy chunk or a render error shows here, inside the shell. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : undefined;
  return (
    <div className="p-8">
      <ErrorState title={message ?? "This page failed to load"} error={error} retry={() => window.location.reload()} />
    </div>
  );
}
