import { useState } from "react";
import { RESULT_CAUTIONS } from "@plumeline/contracts";
import { cx } from "./cx";

/** The cautions come from the contracts, so screens and exports say the same words. */
export const CAUTIONS = RESULT_CAUTIONS;

export function Cautions({ className, defaultOpen = false }: { className?: string; defaultOpen?: boolean }) {
  const [open, setOpen] = useState(defaultOpen);
  return (
    <aside aria-label="Cautions" className={cx("rounded-md border border-line border-l-4 border-l-ember-400 bg-surface px-4 py-3 text-sm", className)}>
      <div className="flex items-center justify-between gap-3">
        <p className="text-muted">
          <span className="font-semibold text-ink">Read with care.</span> Global mean only · not a catastrophe model · scenarios are not forecasts · exploratory results are not for filing.
        </p>
        <button type="button" className="shrink-0 text-sm font-medium text-accent" aria-expanded={open} onClick={() => setOpen((o) => !o)}>
          {open ? "Hide cautions" : "All cautions"}
        </button>
      </div>
      {open && (
        <ol className="mt-2 list-decimal space-y-1 pl-5 text-text">
          {CAUTIONS.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ol>
      )}
    </aside>
  );
}
