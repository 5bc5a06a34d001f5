import { useRef, type KeyboardEvent } from "react";
import { cx } from "./cx";

/**
 * A small single-choice control (radio group semantics) for picking a pathway, year or
 * threshold. Keyboard as the WAI-ARIA radio group pattern: one Tab stop (the chosen option),
 * arrow keys move the choice and focus, Home/End jump to the ends.
 */
export function Segmented<T extends string | number>({
  label,
  options,
  value,
  onChange,
}: {
  label: string;
  options: Array<{ value: T; label: string }>;
  value: T;
  onChange: (v: T) => void;
}) {
  const refs = useRef<Array<HTMLButtonElement | null>>([]);
  const chosen = options.findIndex((o) => o.value === value);
  // With no option chosen, the first one takes the Tab stop so the group stays reachable.
  const tabStop = chosen >= 0 ? chosen : 0;

  function onKeyDown(e: KeyboardEvent<HTMLDivElement>) {
    const last = options.length - 1;
    const from = chosen >= 0 ? chosen : 0;
    const next =
      e.key === "ArrowRight" || e.key === "ArrowDown"
        ? (from + 1) % options.length
        : e.key === "ArrowLeft" || e.key === "ArrowUp"
          ? (from - 1 + options.length) % options.length
          : e.key === "Home"
            ? 0
            : e.key === "End"
              ? last
              : null;
    if (next === null || !options[next]) return;
    e.preventDefault();
    onChange(options[next].value);
    refs.current[next]?.focus();
  }

  return (
    <div role="radiogroup" aria-label={label} onKeyDown={onKeyDown} className="inline-flex flex-wrap rounded-md border border-line bg-surface-2 p-0.5">
      {options.map((o, i) => (
        <button
          key={String(o.value)}
          ref={(el) => {
            refs.current[i] = el;
          }}
          type="button"
          role="radio"
          aria-checked={o.value === value}
          tabIndex={i === tabStop ? 0 : -1}
          onClick={() => onChange(o.value)}
          className={cx(
            "rounded px-2.5 py-1 text-xs font-medium transition-colors focus-visible:outline-2 focus-visible:outline-accent",
            o.value === value ? "bg-surface text-ink shadow-card" : "text-muted hover:text-ink",
          )}
        >
          {o.label}
        </button>
      ))}
    </div>
  );
}
