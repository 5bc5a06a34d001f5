import type { UseQueryResult } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { ErrorState, LoadingState } from "@/components/ui/states";
import { listErrorTitle } from "./list-field-errors";
import { ListPager } from "./list-pager";
import type { ListQueryState } from "./use-list-query";

/**
 * The body of a server-paged list: loading, a failure (a refused filter is titled as such,
 * any other names the list, as a page may hold more than one),
 * the empty message, or the rows and the pager. The previous page stays while the next loads.
 */
export function PagedList<T, F extends string>({
  result,
  noun,
  state,
  onOffset,
  empty,
  children,
}: {
  result: UseQueryResult<{ items: T[]; total: number }>;
  noun: string;
  state: ListQueryState<F>;
  onOffset: (offset: number) => void;
  empty: ReactNode;
  children: (items: T[]) => ReactNode;
}) {
  if (result.isPending) return <LoadingState label={`Loading ${noun}…`} />;
  if (result.isError)
    return (
      <div className="p-4">
        <ErrorState
          error={result.error}
          title={listErrorTitle(result.error) ?? `The ${noun} could not be loaded`}
          retry={() => void result.refetch()}
        />
      </div>
    );
  const { items, total } = result.data;
  return (
    <>
      {items.length === 0 ? <div className="p-4">{empty}</div> : children(items)}
      <ListPager
        noun={noun}
        total={total}
        offset={state.offset}
        limit={state.limit}
        shown={items.length}
        loading={result.isPlaceholderData}
        onOffset={onOffset}
      />
    </>
  );
}
