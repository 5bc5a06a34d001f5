import { useState, type ReactNode } from "react";
import { Field } from "@/components/ui/field";
import type { PickerSource } from "./picker-source";
import { SearchCombobox } from "./search-combobox";

/**
 * A labelled picker of one item from a list of any length: type part of a name, the server
 * answers with matches. The chosen item's label stays in the box (and above the matches while
 * someone searches) even when it is not among the current matches.
 */
export function SearchPicker<T extends { id: string }>({
  label,
  hint,
  error,
  className,
  source,
  itemLabel,
  itemDetail,
  isDisabled,
  value,
  selected,
  onChange,
  placeholder = "Type to search…",
}: {
  label: string;
  hint?: ReactNode;
  error?: string | undefined;
  className?: string | undefined;
  source: PickerSource<T>;
  itemLabel: (item: T) => string;
  itemDetail?: ((item: T) => ReactNode) | undefined;
  isDisabled?: ((item: T) => boolean) | undefined;
  /** The chosen item's id; "" while none is chosen. */
  value: string;
  /** The chosen item when the caller already holds it (a choice made elsewhere, from a link, say). */
  selected?: T | null | undefined;
  onChange: (id: string, item: T) => void;
  placeholder?: string;
}) {
  // The item picked here, so its label survives searches that no longer list it.
  const [picked, setPicked] = useState<T | null>(null);
  const current = [picked, selected].find((x) => x && x.id === value) ?? null;
  const restingText = current ? itemLabel(current) : "";
  return (
    <Field label={label} hint={hint} error={error} {...(className ? { className } : {})}>
      {(p) => (
        <SearchCombobox
          inputProps={p}
          label={label}
          source={source}
          itemLabel={itemLabel}
          {...(itemDetail ? { itemDetail } : {})}
          {...(isDisabled ? { isDisabled } : {})}
          isChosen={(id) => id === value}
          onPick={(item) => {
            setPicked(item);
            onChange(item.id, item);
          }}
          restingText={restingText}
          chosenNote={
            restingText && (
              <>
                Chosen: <span className="font-medium text-ink">{restingText}</span>
              </>
            )
          }
          placeholder={placeholder}
        />
      )}
    </Field>
  );
}
