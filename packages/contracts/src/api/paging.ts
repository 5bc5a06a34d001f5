import { z } from "zod";

/** Rows a list answers when the caller does not say; big enough for one screen. */
export const DEFAULT_PAGE_LIMIT = 50;
/** Largest page a list answers: bounds the work of one request whatever the caller asks. */
export const MAX_PAGE_LIMIT = 200;

export type SortDirection = "asc" | "desc";
/** A list's sort as the query string carries it: `<key>:<asc|desc>`, e.g. `createdAt:desc`. */
export type SortParam<K extends string> = `${K}:${SortDirection}`;

/** Every `<key>:asc` and `<key>:desc` of an allow-list, in order. */
export function sortOptions<const K extends string>(keys: readonly K[]): Array<SortParam<K>> {
  return keys.flatMap((k) => [`${k}:asc`, `${k}:desc`] as Array<SortParam<K>>);
}

/** Splits `createdAt:desc` into its key and direction (the schema has already checked it). */
export function parseSort<K extends string>(sort: SortParam<K>): { key: K; direction: SortDirection } {
  const at = sort.lastIndexOf(":");
  return { key: sort.slice(0, at) as K, direction: sort.slice(at + 1) as SortDirection };
}

/** An ISO date (a whole day) or an ISO date-time with an offset; from/to are inclusive. */
export const listDateSchema = z.iso
  .datetime({ offset: true, error: "must be an ISO date (YYYY-MM-DD) or date-time" })
  .or(z.iso.date({ error: "must be an ISO date (YYYY-MM-DD) or date-time" }));

/**
 * The query-string part every list shares: free-text `q`, `sort` from the list's own
 * allow-list, `limit` (1..200, default 50) and `offset` (>= 0). Each list extends it with
 * its filters. Strings arrive from a query string, so numbers are coerced.
 */
export function pagedQuerySchema<const K extends string>(sortKeys: readonly [K, ...K[]], defaultSort: SortParam<K>) {
  const options = sortOptions(sortKeys);
  return z.object({
    q: z.string().trim().max(200, { error: "must be at most 200 characters" }).optional(),
    // The enum is typed as plain strings (zod cannot follow the template-literal generic);
    // the transform gives the parsed value its precise type back.
    sort: z
      .enum(options as [string, ...string[]], { error: `must be one of ${options.join(", ")}` })
      .default(defaultSort)
      .transform((v) => v as SortParam<K>),
    limit: z.coerce
      .number({ error: "must be a whole number" })
      .int({ error: "must be a whole number" })
      .min(1, { error: "must be at least 1" })
      .max(MAX_PAGE_LIMIT, { error: `must be at most ${MAX_PAGE_LIMIT}` })
      .default(DEFAULT_PAGE_LIMIT),
    offset: z.coerce
      .number({ error: "must be a whole number" })
      .int({ error: "must be a whole number" })
      .min(0, { error: "must be 0 or more" })
      .default(0),
  });
}

/** Filters shared by lists that have an author and a creation date. */
export const authorAndDateFilters = {
  /** Part of the author's name or email, case-insensitive (people are searched by name, not id). */
  author: z.string().trim().min(1).max(200).optional(),
  from: listDateSchema.optional(),
  to: listDateSchema.optional(),
};

/** `{ items, total }`: one page of a list and how many rows match in all. */
export function pageSchema<T extends z.ZodType>(item: T) {
  return z.object({ items: z.array(item), total: z.number().int().min(0) });
}
export interface Page<T> {
  items: T[];
  total: number;
}

/**
 * What a caller sends for a list (all optional): the schema's input, with limit and offset
 * as numbers (the schema coerces query-string text, so its own input type is `unknown`).
 */
export type ListQueryInput<S extends z.ZodType> = Omit<z.input<S>, "limit" | "offset"> & { limit?: number; offset?: number };
