import type { ReactNode } from "react";

/**
 * One line under a percentile table saying what its columns mean, in the words an actuary
 * needs: percentiles run across ensemble members, and describe climate uncertainty given the
 * pathway — not return periods, and not the chance of the pathway itself. Bands are named by
 * their percentiles only: the assessment's calibrated likelihood terms belong to its authors'
 * assessed ranges, not to a raw ensemble's spread.
 */
export function PercentileNote({ children }: { children?: ReactNode }) {
  return (
    <p className="mt-2 text-xs text-muted">
      Percentiles across the ensemble's members: the 5th pct is the value 5 % of members fall below; 50th = median. Bands are
      named by their percentiles (17th–83rd, 5th–95th): they are spreads of this model's ensemble, not an assessment's
      calibrated ranges. They describe climate uncertainty given the pathway, not the chance of the pathway or a return
      period.{children && <> {children}</>}
    </p>
  );
}
