import { useState, type ReactNode } from "react";
import { Field } from "@/components/ui/field";
import type { PickerSource } from "./picker-source";
import { SearchCombobox } from "./search-combobox";

/**
 * A labelled picker of several items from a list of any length: type part of a name and choose
 * matches (choosing a chosen one again removes it); the chosen items are listed under the box,
 * each with a Remove button. Ids chosen earlier whose item is not known here stay listed (and
 * removable) so nothing disappears silently.
 */
export function SearchMultiPicker<T extends { id: string }>({
  label,
  hint,
  error,
  className,
  source,
  itemLabel,
  itemDetail,
  value,
  known = [],
  onChange,
  placeholder = "Type to search, choose to add…",
  noneChosen,
}: {
  label: string;
  hint?: ReactNode;
  error?: string | undefined;
  className?: string | undefined;
  source: PickerSource<T>;
  itemLabel: (item: T) => string;
  itemDetail?: ((item: T) => ReactNode) | undefined;
  /** The chosen ids, in the order they were chosen. */
  value: readonly string[];
  /** Items the caller already holds (those chosen before this screen opened, say), for their labels. */
  known?: readonly T[];
  onChange: (ids: string[]) => void;
  placeholder?: string;
  /** Said under the box while nothing is chosen. */
  noneChosen?: ReactNode;
}) {
  // Items picked here, so their labels stay whatever the current search shows.
  const [picked, setPicked] = useState<ReadonlyMap<string, T>>(new Map());
  const find = (id: string) => picked.get(id) ?? known.find((k) => k.id === id);
  const toggle = (item: T) => {
    if (value.includes(item.id)) onChange(value.filter((x) => x !== item.id));
    else {
      setPicked((m) => new Map(m).set(item.id, item));
      onChange([...value, item.id]);
    }
  };
  return (
    <Field label={label} hint={hint} error={error} {...(className ? { className } : {})}>
      {(p) => (
        <>
          <SearchCombobox
            inputProps={p}
            label={label}
            source={source}
            itemLabel={itemLabel}
            {...(itemDetail ? { itemDetail } : {})}
            isChosen={(id) => value.includes(id)}
            onPick={toggle}
            restingText=""
            chosenNote={value.length > 0 && `${value.length} chosen (listed under the box)`}
            placeholder={placeholder}
            multiple
          />
          {value.length === 0 ? (
            noneChosen && <p className="text-xs text-muted">{noneChosen}</p>
          ) : (
            <ul aria-label={`Chosen: ${label}`} className="grid gap-1 sm:grid-cols-2 xl:grid-cols-3">
              {value.map((id) => {
                const item = find(id);
                const name = item ? itemLabel(item) : id;
                return (
                  <li
                    key={id}
                    className="flex items-center justify-between gap-2 rounded-md border border-line bg-surface-2 px-2.5 py-1 text-sm"
                  >
                    <span className="min-w-0">
                      {item ? <span className="font-medium text-ink">{name}</span> : <code className="text-xs text-danger">{id}</code>}
                      {item && itemDetail && <span className="block text-xs text-muted">{itemDetail(item)}</span>}
                      {!item && <span className="block text-xs text-danger">Not found — remove it, or keep it if it is still wanted</span>}
                    </span>
                    <button
                      type="button"
                      aria-label={`Remove ${name}`}
                      onClick={() => onChange(value.filter((x) => x !== id))}
                      className="shrink-0 rounded px-1.5 text-muted hover:bg-surface hover:text-ink"
                    >
                      Remove
                    </button>
                  </li>
                );
              })}
            </ul>
          )}
        </>
      )}
    </Field>
  );
}
