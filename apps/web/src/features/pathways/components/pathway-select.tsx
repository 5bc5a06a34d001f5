import { SearchPicker } from "@/components/search-picker/search-picker";
import { pathwayPickerSource } from "../api/get-pathways";

/** A stored pathway as a picker shows it. */
export interface PathwayChoice {
  id: string;
  name: string;
  startYear: number;
  endYear: number;
}

/**
 * A labelled, searchable picker of stored pathways, each shown with its years; "" while none is
 * chosen. Any pathway can be reached by typing part of its name, however many are stored.
 */
export function PathwaySelect({
  label,
  value,
  onChange,
  selected,
  error,
  hint,
  className,
}: {
  label: string;
  value: string;
  onChange: (id: string) => void;
  /** The chosen pathway when the caller already holds it (chosen on another visit, from a link). */
  selected?: PathwayChoice | undefined;
  error?: string | undefined;
  hint?: string;
  className?: string;
}) {
  return (
    <SearchPicker<PathwayChoice>
      label={label}
      source={pathwayPickerSource}
      itemLabel={(c) => c.name}
      itemDetail={(c) => `${c.startYear}–${c.endYear}`}
      value={value}
      selected={selected}
      onChange={onChange}
      placeholder="Type part of a pathway's name…"
      {...(error ? { error } : {})}
      {...(hint ? { hint } : {})}
      {...(className ? { className } : {})}
    />
  );
}
