import { ErrorState } from "@/components/ui/states";
import { perilErrorHeading } from "../lib/peril-error-heading";

/**
 * A failed save, copy or delete on a peril profile: a heading naming the kind of refusal
 * (locked, still named by a draft, not the creator, role not allowed) over the server's own
 * sentence, which says what to do next. Renders nothing when there is no error.
 */
export function PerilActionError({ error }: { error: unknown }) {
  if (!error) return null;
  return <ErrorState error={error} title={perilErrorHeading(error) ?? undefined} />;
}
