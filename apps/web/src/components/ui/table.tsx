import type { HTMLAttributes, TdHTMLAttributes, ThHTMLAttributes } from "react";
import { cx } from "./cx";

export function Table({ className, ...props }: HTMLAttributes<HTMLTableElement>) {
  return (
    <div className="overflow-x-auto">
      <table className={cx("w-full border-collapse text-sm", className)} {...props} />
    </div>
  );
}

/**
 * A column heading; with scope="row" a row heading, which sits in the body and so takes the
 * body's hairline rule instead of the heading row's strong one (otherwise the first column's
 * separators stand out darker than the rest of the row).
 */
export function Th({ className, numeric, ...props }: ThHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return (
    <th
      className={cx(
        "border-b px-3 py-2 text-left text-xs font-semibold uppercase tracking-wider text-muted",
        props.scope === "row" ? "border-line" : "border-line-strong",
        numeric && "text-right",
        className,
      )}
      {...props}
    />
  );
}

export function Td({ className, numeric, ...props }: TdHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return <td className={cx("border-b border-line px-3 py-2 align-top", numeric && "num text-right", className)} {...props} />;
}
