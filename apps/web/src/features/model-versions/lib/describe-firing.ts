import type { MaterialityFiring } from "@plumeline/contracts";

/**
 * A signed value with enough decimals to be seen passing its limit: 0.104 K against 0.1 K reads
 * "+0.104", never "+0.10 K > 0.1 K" (up to four decimals). Same rule as the API's sentence.
 */
function signed(v: number, digits: number, limit: number): string {
  let d = digits;
  while (d < 4 && Number(Math.abs(v).toFixed(d)) <= limit) d++;
  return `${v >= 0 ? "+" : "−"}${Math.abs(v).toFixed(d)}`;
}

const METRIC_LABEL: Record<MaterialityFiring["metric"], string> = {
  "median-shift": "median shift",
  "width-change": "5–95 % width change",
  exceedance: "exceedance change",
};

/** The metric a firing is about, in words: "median shift", "P(>1.5 K) change". */
export function firingMetric(f: MaterialityFiring): string {
  return f.metric === "exceedance" ? `P(>${f.warmingThreshold} K) change` : METRIC_LABEL[f.metric];
}

/** "median shift +0.14 K > 0.1 K on Harbourline Middle 2050" — the same sentence the API's 409 uses. */
export function describeFiring(f: MaterialityFiring): string {
  const digits = f.unit === "K" ? 2 : 1;
  return `${firingMetric(f)} ${signed(f.value, digits, f.limit)} ${f.unit} > ${f.limit} ${f.unit} on ${f.pathwayName} ${f.year}`;
}
