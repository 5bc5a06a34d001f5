/**
 * How numbers read wherever Plumeline shows them — the run page, the PDF report and chart
 * downloads — so a figure on screen and the same figure in the report are the same text.
 * (CSV keeps full precision; the workbook keeps the value and sets a number format.)
 */

/**
 * `v.toFixed(digits)` without the minus sign of a value that rounds to zero: -0.0004 and -0
 * read "0.000", not "-0.000" (which looks like a sign error). Example: formatFixed(-0.0006, 3) === "-0.001".
 */
export function formatFixed(v: number, digits: number): string {
  const text = v.toFixed(digits);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

const missing = (v: number | null | undefined): v is null | undefined => v === null || v === undefined || !Number.isFinite(v);

/** Warming in K to two decimals (a percentile of warming is good to about 0.01 K). */
export const formatKelvin = (v: number | null | undefined, digits = 2) => (missing(v) ? "–" : formatFixed(v, digits));

export const formatPercent = (share: number | null | undefined, digits = 0) => (missing(share) ? "–" : `${formatFixed(share * 100, digits)} %`);

/**
 * A probability as a whole percent that never rounds a possibility away: 0.48 % reads "< 1 %",
 * not "0 %" (which says it cannot happen), and 99.94 % reads "> 99 %", not "100 %". Only an
 * exact 0 or 1 — no member or every member — prints as 0 % or 100 %.
 */
export function formatProbability(share: number | null | undefined): string {
  if (missing(share)) return "–";
  if (share > 0 && share < 0.005) return "< 1 %";
  if (share < 1 && share >= 0.995) return "> 99 %";
  return formatPercent(share, 0);
}

/** A money scale: amounts are divided by `divisor` and the unit reads "EUR m". */
export interface MoneyScale {
  divisor: number;
  /** "", "k", "m" or "bn". */
  suffix: string;
}

/**
 * The one scale for a set of amounts shown together (a table or a chart axis), chosen by the
 * largest magnitude so every figure of the set reads in the same unit: ≥ 1 bn → bn, ≥ 1 m → m,
 * ≥ 1 k → k. Example: moneyScale([18_400_000, 455_000_000]) → { divisor: 1e6, suffix: "m" }.
 */
export function moneyScale(amounts: ReadonlyArray<number | null | undefined>): MoneyScale {
  const largest = Math.max(0, ...amounts.filter((v): v is number => !missing(v)).map(Math.abs));
  if (largest >= 1e9) return { divisor: 1e9, suffix: "bn" };
  if (largest >= 1e6) return { divisor: 1e6, suffix: "m" };
  if (largest >= 1e3) return { divisor: 1e3, suffix: "k" };
  return { divisor: 1, suffix: "" };
}

/** The unit of a money column or axis: "EUR m". */
export const moneyUnit = (currency: string, scale: MoneyScale) => (scale.suffix ? `${currency} ${scale.suffix}` : currency);

/**
 * A number to `figures` significant figures, written with thousands separators and the
 * decimals those figures need: 4.3 → "4.30", 18.44 → "18.4", 458.39 → "458", 1234 → "1,230".
 * Losses come from baseline figures times multipliers good to about three significant figures,
 * so more digits would claim a precision the numbers do not have. `signed` writes "+" before
 * a positive value (for changes). Example: formatSignificant(0.012345, 3) === "0.0123".
 */
export function formatSignificant(v: number | null | undefined, figures = 3, signed = false): string {
  if (missing(v)) return "–";
  if (v === 0) return "0";
  const rounded = Number(v.toPrecision(figures));
  const magnitude = Math.floor(Math.log10(Math.abs(rounded)));
  const decimals = Math.max(0, figures - 1 - magnitude);
  const text = Math.abs(rounded).toLocaleString("en-GB", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
  const sign = rounded < 0 ? "-" : signed ? "+" : "";
  return `${sign}${text}`;
}

/** An amount in a scale at three significant figures: formatMoney(458_388_776, { divisor: 1e6, suffix: "m" }) === "458". */
export const formatMoney = (v: number | null | undefined, scale: MoneyScale, signed = false) =>
  missing(v) ? "–" : formatSignificant(v / scale.divisor, 3, signed);

/** "p17" -> 17 */
export const percentileOfKey = (key: string) => Number(key.slice(1));

/**
 * A percentile key as a column heading an actuary cannot misread as a share of loss:
 * "p5" -> "5th pct", "p83" -> "83rd pct" (English ordinals: 1st, 2nd, 3rd, 11th–13th, nth).
 */
export function percentileHeading(key: string): string {
  const n = percentileOfKey(key);
  const lastTwo = n % 100;
  const suffix = lastTwo >= 11 && lastTwo <= 13 ? "th" : ({ 1: "st", 2: "nd", 3: "rd" } as Record<number, string>)[n % 10] ?? "th";
  return `${n}${suffix} pct`;
}
