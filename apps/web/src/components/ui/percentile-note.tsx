import type { ReactNode } from "react";

/**
 * One line under a percentile table saying what its columns mean, in the words an actuary
 * needs: percentiles run across ensemble members, and describe climate uncertainty given the
 * pathway — not return periods, and not the chance of the pathway itself.
 */
export function PercentileNote({ children }: { children?: ReactNode }) {
  return (
    <p className="mt-2 text-xs text-muted">
      Percentiles across the ensemble's members: the 5th pct is the value 5 % of members fall below; 50th = median; 17th–83rd is
      the likely range, 5th–95th very likely. They describe climate uncertainty given the pathway, not the chance of the pathway
      or a return period.{children && <> {children}</>}
    </p>
  );
}
