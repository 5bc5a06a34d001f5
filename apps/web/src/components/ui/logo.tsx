import { cx } from "./cx";

/** Wordmark: a rising plume line over its own band. */
export function Logo({ className }: { className?: string }) {
  return (
    <span className={cx("inline-flex items-center gap-2 font-semibold tracking-tight", className)}>
      <svg aria-hidden viewBox="0 0 32 32" className="h-7 w-7">
        <rect width="32" height="32" rx="7" fill="#13294b" stroke="#ffffff22" />
        <path d="M5 24 C 12 23, 17 19, 27 13" stroke="#e8913d" strokeOpacity=".45" strokeWidth="6" fill="none" strokeLinecap="round" />
        <path d="M5 24 C 11 22, 16 16, 27 8" stroke="#f6c489" strokeWidth="2.5" fill="none" strokeLinecap="round" />
      </svg>
      <span className="text-lg">Plumeline</span>
    </span>
  );
}
