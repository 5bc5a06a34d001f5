import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { TYPING_PAUSE_MS } from "@/components/lists/debounced-input";
import { useDebouncedValue } from "@/lib/use-debounced-value";
import { PICKER_PAGE_SIZE, type PickerSource } from "./picker-source";

/**
 * The server's matches for what is typed into a picker: asked once typing pauses (one request
 * per pause, not per key), only while the list is open, and the previous matches stay on
 * screen while the next ones load so the list does not flash empty.
 */
export function usePickerMatches<T extends { id: string }>(source: PickerSource<T>, text: string, open: boolean) {
  const q = useDebouncedValue(text.trim(), TYPING_PAUSE_MS);
  const query = { q, limit: PICKER_PAGE_SIZE };
  const result = useQuery({
    queryKey: [...source.queryKey, "picker", query],
    queryFn: ({ signal }) => source.fetchMatches(query, signal),
    enabled: open,
    placeholderData: keepPreviousData,
  });
  return { ...result, q };
}
