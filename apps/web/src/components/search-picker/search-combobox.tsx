import { useEffect, useId, useState, type KeyboardEvent, type ReactNode } from "react";
import { cx } from "@/components/ui/cx";
import type { PickerSource } from "./picker-source";
import { usePickerMatches } from "./use-picker-matches";

export interface SearchComboboxProps<T extends { id: string }> {
  /** The input's id and description ids, from the surrounding Field. */
  inputProps: { id: string; "aria-describedby"?: string; "aria-invalid"?: boolean };
  /** Names the list of matches for assistive technology (the field's label). */
  label: string;
  source: PickerSource<T>;
  itemLabel: (item: T) => string;
  /** A second, quieter line under an item (years, status…). */
  itemDetail?: (item: T) => ReactNode;
  /** Items shown but not choosable, with the reason in their detail (a retired version, say). */
  isDisabled?: (item: T) => boolean;
  isChosen: (id: string) => boolean;
  onPick: (item: T) => void;
  /** What the box shows when no one is typing in it: the chosen item's label ("" for none). */
  restingText: string;
  /** Shown above the matches while someone searches, so the current choice stays in sight. */
  chosenNote?: ReactNode;
  placeholder?: string;
  /** Several items can be chosen: the list stays open after a pick. */
  multiple?: boolean;
  disabled?: boolean;
  className?: string;
}

/**
 * A text box with a list of the server's matches under it: the ARIA 1.2 combobox pattern with
 * list autocomplete (the box keeps focus; the highlighted option is named by
 * aria-activedescendant). Keys: Down/Up open the list and move through it, Enter chooses,
 * Escape closes it and puts the chosen label back, Tab leaves. Searches by what is typed, so
 * any item can be reached however many there are.
 */
export function SearchCombobox<T extends { id: string }>({
  inputProps,
  label,
  source,
  itemLabel,
  itemDetail,
  isDisabled = () => false,
  isChosen,
  onPick,
  restingText,
  chosenNote,
  placeholder,
  multiple = false,
  disabled = false,
  className,
}: SearchComboboxProps<T>) {
  const listId = useId();
  const [open, setOpen] = useState(false);
  // `typed` is null until someone types: opening the list without typing shows every item
  // (newest first), not just those matching the chosen label.
  const [typed, setTyped] = useState<string | null>(null);
  const [active, setActive] = useState(-1);
  const matches = usePickerMatches(source, typed ?? "", open);
  const items = matches.data?.items ?? [];
  const total = matches.data?.total ?? 0;
  const activeIndex = active < items.length ? active : -1;
  const optionId = (i: number) => `${listId}-option-${i}`;

  useEffect(() => {
    // Keeps the highlighted option in view when the keys move past the list's visible part.
    if (open && activeIndex >= 0) document.getElementById(optionId(activeIndex))?.scrollIntoView?.({ block: "nearest" });
  });

  const close = () => {
    setOpen(false);
    setTyped(null);
    setActive(-1);
  };

  const pick = (item: T) => {
    if (isDisabled(item)) return;
    onPick(item);
    if (!multiple) close();
  };

  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    const last = items.length - 1;
    switch (e.key) {
      case "ArrowDown":
        e.preventDefault();
        if (!open) {
          setOpen(true);
          setActive(0);
        } else setActive(activeIndex >= last ? 0 : activeIndex + 1);
        break;
      case "ArrowUp":
        e.preventDefault();
        if (!open) {
          setOpen(true);
          setActive(last);
        } else setActive(activeIndex <= 0 ? last : activeIndex - 1);
        break;
      case "Enter": {
        // An open list owns Enter, so choosing never submits the form around it by accident.
        if (!open) return;
        e.preventDefault();
        const item = items[activeIndex];
        if (item) pick(item);
        break;
      }
      case "Escape":
        if (!open) return;
        // Stops here so a dialog or page around the picker does not treat it as its own Escape.
        e.preventDefault();
        e.stopPropagation();
        close();
        break;
    }
  };

  // Until the typed text has been asked about, the list shows the previous text's matches.
  const settling = (typed ?? "").trim() !== matches.q || matches.isFetching;
  const status = matches.isError
    ? `Could not search: ${matches.error.message}`
    : matches.isPending || settling
      ? "Searching…"
      : items.length === 0
        ? matches.q
          ? `Nothing matches “${matches.q}”.`
          : "Nothing to choose from yet."
        : total > items.length
          ? `${(total - items.length).toLocaleString("en-GB")} more match — keep typing`
          : "";

  return (
    <div className={cx("relative", className)}>
      <input
        {...inputProps}
        type="text"
        role="combobox"
        aria-expanded={open}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={open && activeIndex >= 0 ? optionId(activeIndex) : undefined}
        autoComplete="off"
        spellCheck={false}
        disabled={disabled}
        placeholder={placeholder}
        value={typed ?? restingText}
        onChange={(e) => {
          setTyped(e.target.value);
          setOpen(true);
          setActive(-1);
        }}
        // Selecting the label on focus means typing replaces it rather than adding to it.
        onFocus={(e) => e.currentTarget.select()}
        onClick={() => setOpen(true)}
        onBlur={close}
        onKeyDown={onKeyDown}
        className={cx(
          "w-full rounded-md border bg-surface px-2.5 py-1.5 text-sm text-text placeholder:text-faint focus:outline-2 focus:outline-accent disabled:opacity-60",
          inputProps["aria-invalid"] ? "border-danger" : "border-line-strong",
        )}
      />
      {open && (
        <div className="absolute z-30 mt-1 w-full min-w-64 rounded-md border border-line-strong bg-surface shadow-card">
          {typed !== null && chosenNote && <p className="border-b border-line px-2.5 py-1.5 text-xs text-muted">{chosenNote}</p>}
          <ul
            role="listbox"
            id={listId}
            aria-label={label}
            aria-multiselectable={multiple || undefined}
            className={cx("max-h-72 overflow-auto", items.length > 0 && "py-1")}
          >
            {items.map((item, i) => {
              const off = isDisabled(item);
              const chosen = isChosen(item.id);
              return (
                <li
                  key={item.id}
                  id={optionId(i)}
                  role="option"
                  aria-selected={chosen}
                  // Named by the label alone (the detail is its description), so "Harbourline High" is not read
                  // as "Harbourline High1750–2100".
                  aria-labelledby={`${optionId(i)}-label`}
                  aria-describedby={itemDetail ? `${optionId(i)}-detail` : undefined}
                  aria-disabled={off || undefined}
                  // Keeps focus in the box, so the click below still finds the list open.
                  onMouseDown={(e) => e.preventDefault()}
                  onClick={() => pick(item)}
                  onMouseMove={() => activeIndex !== i && setActive(i)}
                  className={cx(
                    "flex cursor-pointer items-start gap-2 px-2.5 py-1.5 text-sm",
                    i === activeIndex && "bg-accent-soft",
                    off && "cursor-not-allowed opacity-60",
                  )}
                >
                  <span aria-hidden className="w-3 shrink-0 text-accent">
                    {chosen ? "✓" : ""}
                  </span>
                  <span className="min-w-0">
                    <span id={`${optionId(i)}-label`} className="block truncate font-medium text-ink">
                      {itemLabel(item)}
                    </span>
                    {itemDetail && (
                      <span id={`${optionId(i)}-detail`} className="block text-xs text-muted">
                        {itemDetail(item)}
                      </span>
                    )}
                  </span>
                </li>
              );
            })}
          </ul>
          {status && (
            <p
              role={matches.isError ? "alert" : "status"}
              className={cx("border-t border-line px-2.5 py-1.5 text-xs", matches.isError ? "text-danger" : "text-muted")}
            >
              {status}
            </p>
          )}
        </div>
      )}
    </div>
  );
}
