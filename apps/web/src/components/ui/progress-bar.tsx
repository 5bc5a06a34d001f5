import { cx } from "./cx";

/** Progress 0–1 with an accessible value; striped while running so movement is visible. */
export function ProgressBar({ value, label, running, className }: { value: number; label: string; running?: boolean; className?: string }) {
  const pct = Math.max(0, Math.min(1, value)) * 100;
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={Math.round(pct)}
      className={cx("h-2 w-full overflow-hidden rounded-full bg-surface-2", className)}
    >
      <div
        className={cx("h-full rounded-full bg-ember-400 transition-[width] duration-500", running && "animate-pulse")}
        style={{ width: `${pct}%` }}
      />
    </div>
  );
}
