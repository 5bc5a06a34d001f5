import { BAND_LABELS } from "./band-labels";

/**
 * The fan chart's key to its bands: what the light band, the strong band and the line are,
 * each named by its percentiles.
 */
export function BandKey() {
  return (
    <ul aria-label="Bands" className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-muted">
      <li className="flex items-center gap-1.5">
        <span aria-hidden className="h-2.5 w-4 rounded-sm bg-ink/15" />
        {BAND_LABELS.outer}
      </li>
      <li className="flex items-center gap-1.5">
        <span aria-hidden className="h-2.5 w-4 rounded-sm bg-ink/35" />
        {BAND_LABELS.inner}
      </li>
      <li className="flex items-center gap-1.5">
        <span aria-hidden className="h-0.5 w-4 bg-ink" />
        {BAND_LABELS.median}
      </li>
    </ul>
  );
}
