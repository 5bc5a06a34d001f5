/**
 * The Excel number format of an export column, read from its name, so every numeric cell
 * shows as an actuary writes it instead of a 17-digit float (the stored value keeps full
 * precision; only its display changes):
 * * years, horizons, counts → 0 (2050, not 2,050.00);
 * * probabilities and shares (0–1) → 0.0 %;
 * * money (losses, AAL, totals and their change) → #,##0 in the row's currency;
 * * return periods → #,##0.0 years; multipliers → 0.000;
 * * kelvin and W m-2 → 0.00; anything else numeric → #,##0.00.
 * Bare percentile columns (p5 … p95, mean) take the sheet's own quantity: "money" for the
 * portfolio totals, "physical" (K or W m-2) for the yearly temperature, forcing and imbalance.
 */
export function columnNumberFormat(column: string, quantity: "money" | "physical" = "physical"): string {
  if (/^(p\d+(\.\d+)?|mean)$/.test(column)) return quantity === "money" ? "#,##0" : "0.00";
  if (column.startsWith("return_period_")) return "#,##0.0";
  if (/(^|_)(year|years|horizon|rows|projected_rows|baseline_return_period_years|threshold)$/.test(column) || /^p\d+(\.\d+)?_year$/.test(column) || column === "year")
    return "0";
  if (column === "threshold_K") return "0.0#";
  if (column.startsWith("p_exceed_") || column.startsWith("share_") || column === "variance_share") return "0.0%";
  if (column.startsWith("multiplier_")) return "0.000";
  if (column.startsWith("loss_") || column === "baseline" || column.startsWith("change_") || ["aal", "loss100", "loss200"].includes(column))
    return "#,##0";
  if (column.endsWith("_K") || column.endsWith("_Wm2") || column === "index" || column === "rank_correlation" || column === "baseline_warming_K") return "0.00";
  return "#,##0.00";
}
