import type { QueryKey } from "@tanstack/react-query";

/** One page of matches and how many match in all (the shape every list endpoint answers). */
export interface PickerPage<T> {
  items: T[];
  total: number;
}

/**
 * Where a picker finds its items: a feature's own list fetcher, asked with the typed text as
 * `q`, and the prefix of the TanStack Query key it caches under. The prefix is the feature's
 * list key, so a mutation that refreshes the feature's lists refreshes its pickers too.
 */
export interface PickerSource<T extends { id: string }> {
  queryKey: QueryKey;
  fetchMatches: (query: { q: string; limit: number }, signal: AbortSignal) => Promise<PickerPage<T>>;
}

/**
 * Matches a picker shows at once. A short list the eye can scan; anything further is reached by
 * typing more of its name (the box says how many more match), never by scrolling a long page.
 */
export const PICKER_PAGE_SIZE = 20;
