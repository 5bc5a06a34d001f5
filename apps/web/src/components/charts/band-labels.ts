/**
 * How every chart, legend, read-out and table names an ensemble's percentile bands: by their
 * percentiles, nothing else. The assessment's calibrated likelihood terms describe its
 * authors' assessed ranges (IPCC AR6 WG1, Mastrandrea et al. 2010 guidance note); a raw
 * ensemble's spread is not such a range, so the product never names a band with them.
 */
export const BAND_LABELS = {
  outer: "5th–95th percentile",
  inner: "17th–83rd percentile",
  median: "median (50th percentile)",
} as const;

/** Short forms for tight read-outs, e.g. "17th–83rd". */
export const BAND_SHORT_LABELS = {
  outer: "5th–95th",
  inner: "17th–83rd",
} as const;
