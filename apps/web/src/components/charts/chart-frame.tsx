import { useId, useRef, useState, type ReactNode } from "react";
import { cx } from "@/components/ui/cx";
import { ChartDownload } from "./chart-download";
import type { LegendEntry } from "./chart-export";

/**
 * A chart's frame: a title, an optional one-line description, the chart, and a button that
 * swaps it for a table holding the same numbers (the accessible alternative). The SVG gets
 * role="img" with the title as its name so screen readers announce what it shows. Every chart
 * can leave the product as SVG or PNG carrying its title, `units`, `legend` and a footnote.
 */
export function ChartFrame({
  title,
  description,
  table,
  children,
  actions,
  className,
  units,
  legend = [],
}: {
  title: string;
  /** The unit of the chart's values, named in every download ("K", "W m⁻²", "% of members"). */
  units: string;
  /** The chart's key, drawn into downloads (on screen the chart draws its own). */
  legend?: LegendEntry[];
  description?: ReactNode;
  table: ReactNode;
  children: ReactNode;
  actions?: ReactNode;
  className?: string;
}) {
  const [showTable, setShowTable] = useState(false);
  const id = useId();
  const frame = useRef<HTMLElement>(null);
  return (
    <figure ref={frame} className={cx("m-0 flex min-w-0 flex-col gap-2", className)} aria-labelledby={`${id}-title`}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 id={`${id}-title`} className="text-sm font-semibold text-ink">
            {title}
          </h3>
          {description && <p className="text-xs text-muted">{description}</p>}
        </div>
        <div className="flex items-center gap-2">
          {actions}
          {!showTable && <ChartDownload frame={frame} title={title} units={units} legend={legend} />}
          <button
            type="button"
            className="rounded border border-line px-2 py-0.5 text-xs text-muted hover:bg-surface-2"
            aria-pressed={showTable}
            onClick={() => setShowTable((s) => !s)}
          >
            {showTable ? "Show chart" : "Show table"}
          </button>
        </div>
      </div>
      {showTable ? <div className="max-h-96 overflow-auto">{table}</div> : children}
    </figure>
  );
}

/** Small helper for the table alternatives: numeric cells in tabular mono. */
export function DataTable({ columns, rows, caption }: { columns: string[]; rows: Array<Array<string | number>>; caption: string }) {
  return (
    <table className="w-full border-collapse text-xs">
      <caption className="sr-only">{caption}</caption>
      <thead className="sticky top-0 bg-surface">
        <tr>
          {columns.map((c, i) => (
            <th
              key={c}
              scope="col"
              className={cx("border-b border-line-strong px-2 py-1 font-semibold text-muted", i === 0 ? "text-left" : "text-right")}
            >
              {c}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((r, i) => (
          <tr key={i}>
            {r.map((v, j) => (
              <td key={j} className={cx("border-b border-line px-2 py-0.5", j === 0 ? "text-left" : "num text-right")}>
                {v}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
