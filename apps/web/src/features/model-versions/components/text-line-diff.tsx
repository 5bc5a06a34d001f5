import { cx } from "@/components/ui/cx";
import { lineDiff } from "../lib/line-diff";

const MARK = { added: "+", removed: "−", same: " " } as const;
const SPOKEN = { added: "added: ", removed: "removed: ", same: "" } as const;

/**
 * A multi-line text change (the author's notes) as one column of lines: removed lines in
 * red with −, added lines in green with +, unchanged stretches folded, so a reviewer sees
 * the one added line instead of two whole texts side by side.
 */
export function TextLineDiff({ before, after }: { before: string; after: string }) {
  const entries = lineDiff(before, after);
  const added = entries.filter((e) => e.kind === "added").length;
  const removed = entries.filter((e) => e.kind === "removed").length;
  return (
    <div>
      <p className="mb-1 text-xs text-muted">
        {added} line{added === 1 ? "" : "s"} added, {removed} removed
      </p>
      <ol aria-label="Line changes" className="rounded border border-line text-xs">
        {entries.map((e, i) =>
          e.kind === "folded" ? (
            <li key={i} className="bg-surface-2 px-2 py-0.5 text-muted italic">
              … {e.count} unchanged line{e.count === 1 ? "" : "s"}
            </li>
          ) : (
            <li
              key={i}
              data-change={e.kind}
              className={cx(
                "flex gap-2 px-2 py-0.5 whitespace-pre-wrap [overflow-wrap:anywhere]",
                e.kind === "added" && "bg-ok-soft",
                e.kind === "removed" && "bg-danger-soft",
                e.kind === "same" && "text-muted",
              )}
            >
              <span aria-hidden="true" className="num w-3 shrink-0 select-none">
                {MARK[e.kind]}
              </span>
              <span>
                <span className="sr-only">{SPOKEN[e.kind]}</span>
                {e.text || " "}
              </span>
            </li>
          ),
        )}
      </ol>
    </div>
  );
}
