/**
 * A list's query as the fetchers send it (q, sort, limit, offset and the list's filters).
 * Empty values are dropped, so `{ q: "" }` and `{}` are the same query, the same URL and
 * the same TanStack Query key.
 */
export type ListQueryValue = string | number | boolean | undefined | null;

export function compactQuery<Q extends Record<string, ListQueryValue>>(query: Q): Partial<Q> {
  return Object.fromEntries(
    Object.entries(query).filter(([, v]) => v !== undefined && v !== null && v !== "" && v !== false),
  ) as Partial<Q>;
}
