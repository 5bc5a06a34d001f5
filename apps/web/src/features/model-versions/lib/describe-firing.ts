import type { MaterialityFiring } from "@plumeline/contracts";

const signed = (v: number, digits: number) => `${v >= 0 ? "+" : "−"}${Math.abs(v).toFixed(digits)}`;

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
  return `${firingMetric(f)} ${signed(f.value, digits)} ${f.unit} > ${f.limit} ${f.unit} on ${f.pathwayName} ${f.year}`;
}
