import { Button } from "@/components/ui/button";
import { Field, Select } from "@/components/ui/field";
import { DebouncedInput } from "./debounced-input";
import type { ListQueryChange, ListQueryState } from "./use-list-query";

export interface ListOption {
  value: string;
  label: string;
}

export interface ListControlsProps<F extends string> {
  /** What the list holds, for labels: "runs" gives "Search runs". */
  noun: string;
  state: ListQueryState<F>;
  onChange: (change: ListQueryChange<F>) => void;
  searchHint?: string;
  sortOptions: ListOption[];
  /** Filters picked from a list (status, format …); an empty value means "any". */
  selects?: Array<{ key: F; label: string; options: ListOption[] }>;
  /** Free-text filters searched by name (author, actor, entity …). */
  texts?: Array<{ key: F; label: string; placeholder?: string }>;
  /** Yes/no filters, held as "true" / "false". */
  toggles?: Array<{ key: F; label: string }>;
  /** Show "Created from / to" date pickers bound to the `from` and `to` filters. */
  dates?: boolean;
  /** Messages from a refused query, keyed by field (`from`, `sort`, …). */
  errors?: Record<string, string>;
}

/**
 * Search, sort and filters for any server-paged list. It holds no state of its own beyond
 * the text being typed: the page's useListQuery keeps everything in the URL.
 */
export function ListControls<F extends string>({
  noun,
  state,
  onChange,
  searchHint,
  sortOptions,
  selects = [],
  texts = [],
  toggles = [],
  dates = false,
  errors = {},
}: ListControlsProps<F>) {
  const setFilter = (key: F, value: string) => onChange({ filters: { [key]: value } as Partial<Record<F, string>> });
  const filled = state.q !== "" || Object.values<string>(state.filters).some((v) => v !== "" && v !== "false");
  return (
    <div role="search" aria-label={`Search and filter ${noun}`} className="flex flex-wrap items-end gap-3">
      <Field label={`Search ${noun}`} hint={searchHint} error={errors.q} className="min-w-56 flex-[2_1_14rem]">
        {(p) => <DebouncedInput {...p} type="search" value={state.q} onCommit={(q) => onChange({ q })} />}
      </Field>
      <Field label="Sort" error={errors.sort} className="min-w-44 flex-[1_1_11rem]">
        {(p) => (
          <Select {...p} value={state.sort} onChange={(e) => onChange({ sort: e.target.value })}>
            {sortOptions.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </Select>
        )}
      </Field>
      {selects.map((s) => (
        <Field key={s.key} label={s.label} error={errors[s.key]} className="min-w-36 flex-[1_1_9rem]">
          {(p) => (
            <Select {...p} value={state.filters[s.key]} onChange={(e) => setFilter(s.key, e.target.value)}>
              <option value="">Any</option>
              {s.options.map((o) => (
                <option key={o.value} value={o.value}>
                  {o.label}
                </option>
              ))}
            </Select>
          )}
        </Field>
      ))}
      {texts.map((t) => (
        <Field key={t.key} label={t.label} error={errors[t.key]} className="min-w-40 flex-[1_1_10rem]">
          {(p) => (
            <DebouncedInput {...p} value={state.filters[t.key]} placeholder={t.placeholder} onCommit={(v) => setFilter(t.key, v.trim())} />
          )}
        </Field>
      ))}
      {dates && (
        <>
          <DateFilter label="Created from" field={"from" as F} state={state} error={errors.from} onPick={setFilter} />
          <DateFilter label="Created to" field={"to" as F} state={state} error={errors.to} onPick={setFilter} />
        </>
      )}
      {toggles.map((t) => (
        <label key={t.key} className="flex h-9 items-center gap-2 text-sm text-ink">
          <input
            type="checkbox"
            checked={state.filters[t.key] === "true"}
            onChange={(e) => setFilter(t.key, e.target.checked ? "true" : "false")}
          />
          {t.label}
        </label>
      ))}
      <Button
        variant="ghost"
        disabled={!filled}
        onClick={() =>
          onChange({
            q: "",
            filters: Object.fromEntries(
              [...selects, ...texts]
                .map((f) => [f.key, ""])
                .concat(
                  dates
                    ? [
                        ["from", ""],
                        ["to", ""],
                      ]
                    : [],
                ),
            ) as Partial<Record<F, string>>,
          })
        }
      >
        Clear filters
      </Button>
    </div>
  );
}

/**
 * A day picker for `from` / `to`. The browser's date input only hands over complete dates;
 * a bad date that arrives through the URL is refused by the API and named here.
 */
function DateFilter<F extends string>({
  label,
  field,
  state,
  error,
  onPick,
}: {
  label: string;
  field: F;
  state: ListQueryState<F>;
  error: string | undefined;
  onPick: (key: F, value: string) => void;
}) {
  return (
    <Field label={label} error={error ? `${field}: ${error}` : undefined} className="min-w-36 flex-[1_1_9rem]">
      {(p) => (
        <input
          {...p}
          type="date"
          className="w-full rounded-md border border-line-strong bg-surface px-2.5 py-1.5 text-sm text-text"
          value={/^\d{4}-\d{2}-\d{2}$/.test(state.filters[field]) ? state.filters[field] : ""}
          onChange={(e) => onPick(field, e.target.value)}
        />
      )}
    </Field>
  );
}
