import { useCallback, useMemo } from "react";
import { useSearchParamsWriter } from "@/lib/use-search-params-writer";

/** Rows per page unless the URL says otherwise (the API's own default). */
export const DEFAULT_PAGE_SIZE = 50;

export interface ListQueryState<F extends string> {
  q: string;
  sort: string;
  limit: number;
  offset: number;
  /** Each filter's value ("" when unset); toggles hold "true" / "false". */
  filters: Record<F, string>;
}

export interface ListQueryChange<F extends string> {
  q?: string;
  sort?: string;
  filters?: Partial<Record<F, string>>;
}

export interface ListQueryOptions<F extends string> {
  defaultSort: string;
  filterKeys: readonly F[];
  /** Filters that are on unless the URL says otherwise (e.g. hiding sign-ins). */
  defaultFilters?: Partial<Record<F, string>>;
  pageSize?: number;
}

const wholeNumber = (text: string | null, fallback: number, min: number) => {
  const n = text === null ? NaN : Number(text);
  return Number.isInteger(n) && n >= min ? n : fallback;
};

/**
 * A list's search, sort, filters and page, kept in the URL's search params: a filtered page
 * can be bookmarked, shared and reloaded, and Back returns to the previous page. Values equal
 * to their default are left out of the URL. Changing the search, sort or a filter returns to
 * the first page (the old offset may lie past the new total); paging pushes a history entry,
 * typing replaces it so Back is not a keystroke-by-keystroke undo.
 */
export function useListQuery<F extends string>(options: ListQueryOptions<F>) {
  const { defaultSort, filterKeys, defaultFilters, pageSize = DEFAULT_PAGE_SIZE } = options;
  const [params, write] = useSearchParamsWriter();
  // Keys as text so callers may pass fresh array/object literals on every render.
  const filterKeysKey = filterKeys.join(",");
  const defaultFiltersKey = JSON.stringify(defaultFilters ?? {});

  const state = useMemo<ListQueryState<F>>(() => {
    const defaults = JSON.parse(defaultFiltersKey) as Partial<Record<F, string>>;
    const keys = (filterKeysKey === "" ? [] : filterKeysKey.split(",")) as F[];
    return {
      q: params.get("q") ?? "",
      sort: params.get("sort") ?? defaultSort,
      limit: wholeNumber(params.get("limit"), pageSize, 1),
      offset: wholeNumber(params.get("offset"), 0, 0),
      filters: Object.fromEntries(keys.map((k) => [k, params.get(k) ?? defaults[k] ?? ""])) as Record<F, string>,
    };
  }, [params, defaultSort, pageSize, filterKeysKey, defaultFiltersKey]);

  const update = useCallback(
    (change: ListQueryChange<F>) => {
      const defaults = JSON.parse(defaultFiltersKey) as Partial<Record<F, string>>;
      write(
        (prev) => {
          const next = new URLSearchParams(prev);
          const put = (key: string, value: string, fallback: string) => {
            if (value === fallback) next.delete(key);
            else next.set(key, value);
          };
          if (change.q !== undefined) put("q", change.q.trim(), "");
          if (change.sort !== undefined) put("sort", change.sort, defaultSort);
          for (const [key, value] of Object.entries(change.filters ?? {}) as Array<[F, string | undefined]>) {
            if (value !== undefined) put(key, value, defaults[key] ?? "");
          }
          next.delete("offset");
          return next;
        },
        { replace: true },
      );
    },
    [write, defaultSort, defaultFiltersKey],
  );

  const setOffset = useCallback(
    (offset: number) => {
      write((prev) => {
        const next = new URLSearchParams(prev);
        if (offset > 0) next.set("offset", String(offset));
        else next.delete("offset");
        return next;
      });
    },
    [write],
  );

  /** True when a search or a filter other than a default one narrows the list. */
  const filtered = useMemo(() => {
    const defaults = JSON.parse(defaultFiltersKey) as Partial<Record<F, string>>;
    return (
      state.q !== "" || (Object.entries(state.filters) as Array<[F, string]>).some(([k, v]) => v !== (defaults[k] ?? "") && v !== "false")
    );
  }, [state, defaultFiltersKey]);

  return { state, update, setOffset, filtered };
}
