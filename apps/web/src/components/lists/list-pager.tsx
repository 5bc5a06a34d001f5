import { Button } from "@/components/ui/button";
import { Spinner } from "@/components/ui/states";

/**
 * "51–100 of 1,234" with Previous / Next. While the next page loads the current one stays
 * on screen (placeholder data) and a small spinner says so.
 */
export function ListPager({
  noun,
  total,
  offset,
  limit,
  shown,
  loading = false,
  onOffset,
}: {
  noun: string;
  total: number;
  offset: number;
  limit: number;
  shown: number;
  loading?: boolean;
  onOffset: (offset: number) => void;
}) {
  const pages = Math.max(1, Math.ceil(total / limit));
  const page = Math.min(pages, Math.floor(offset / limit) + 1);
  return (
    <nav aria-label={`Pages of ${noun}`} className="flex flex-wrap items-center justify-between gap-2 px-4 py-3 text-sm text-muted">
      <span aria-live="polite" className="flex items-center gap-2">
        {total === 0
          ? `No ${noun}`
          : `${(offset + 1).toLocaleString("en-GB")}–${(offset + shown).toLocaleString("en-GB")} of ${total.toLocaleString("en-GB")} ${noun}`}
        {pages > 1 && (
          <span>
            · page {page} of {pages}
          </span>
        )}
        {loading && <Spinner className="h-3 w-3" />}
      </span>
      <div className="flex gap-2">
        <Button variant="secondary" size="sm" disabled={offset === 0} onClick={() => onOffset(Math.max(0, offset - limit))}>
          Previous
        </Button>
        <Button variant="secondary" size="sm" disabled={offset + limit >= total} onClick={() => onOffset(offset + limit)}>
          Next
        </Button>
      </div>
    </nav>
  );
}
