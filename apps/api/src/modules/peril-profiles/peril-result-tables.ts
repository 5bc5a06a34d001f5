import { BEYOND_TABLE_WARNING_SHARE, type PerilProfileResult, type PerilResult, type PerilSummary, type RunResult } from "@plumeline/contracts";
import type { Table, TableCell } from "../exports/table.js";

/** The peril lens export tables (CSV names; also the workbook sheets below). */
export const PERIL_TABLES = ["peril-multipliers", "peril-return-periods", "peril-losses"] as const;
export type PerilTable = (typeof PERIL_TABLES)[number];

/** Workbook sheet and the note on its first row, per table. */
export const PERIL_TABLE_SHEETS: ReadonlyArray<readonly [PerilTable, string, string]> = [
  [
    "peril-multipliers",
    "Peril multipliers",
    "Multiplier of each peril profile's hazard or loss metric at each horizon (1 = the firm's baseline view of risk), percentiles over members and scaling uncertainty; multiplier_* belong to the return period in multiplier_return_period_years (blank: one multiplier for every return period), multiplier_100yr_* and multiplier_200yr_* to today's 1-in-100 and 1-in-200 events; read_outside_tables lists those read beyond the tables' return periods; share_below_table / share_above_table are the shares of members (0–1) whose warming lies outside the table's warming range, where the end value is held or extrapolated (warning above 5 %)",
  ],
  [
    "peril-return-periods",
    "Return periods",
    "Frequency profiles: return period (years) that today's 1-in-100 and 1-in-200 events would have at each horizon (T / m(T)), percentiles; read_outside_tables = yes when the tables stop at a shorter return period (held or extrapolated beyond them)",
  ],
  [
    "peril-losses",
    "Projected losses",
    "Projected portfolio losses in the row's currency: average annual loss (aal) and 1-in-100 / 1-in-200 annual losses at each horizon, percentiles; exposure growth and adaptation not included",
  ],
];

/** "p5", "p17", … in numeric order, then "mean" — the order a summary is reported in. */
export function summaryKeys(summary: PerilSummary | undefined): string[] {
  if (!summary) return [];
  const keys = Object.keys(summary).filter((k) => k.startsWith("p"));
  keys.sort((a, b) => Number(a.slice(1)) - Number(b.slice(1)));
  return "mean" in summary ? [...keys, "mean"] : keys;
}

/** "10 50": the tables' return periods, or blank for a per-kelvin profile (or an older result). */
const returnPeriodList = (values: readonly number[] | undefined) => (values && values.length ? values.join(" ") : null);

/** The warning text of a horizon whose share of members beyond the table passes 5 %, else blank. */
export function beyondTableWarning(share: { below: number; above: number } | null | undefined, profile: Pick<PerilProfileResult, "table">): string | null {
  if (!share || !profile.table) return null;
  const beyond = share.below + share.above;
  if (!(beyond > BEYOND_TABLE_WARNING_SHARE)) return null;
  const [low, high] = profile.table.warmingRange;
  const rule = profile.table.beyondTable === "hold" ? "held at the end value" : "extrapolated from the end segment";
  return `${(beyond * 100).toFixed(1)} % of members lie outside the table's ${low}–${high} K: their multipliers are ${rule}`;
}

const PROFILE_COLUMNS = ["pathway_id", "pathway_name", "profile_id", "profile_name", "peril", "region", "metric", "baseline_warming_K"];

/** Every (pathway, profile) of the block with the columns that identify it. */
function profileRows(result: RunResult, perils: PerilResult) {
  const names = new Map(result.pathways.map((p) => [p.id, p.name]));
  return perils.pathways.flatMap((pw) =>
    pw.profiles.map((profile) => ({
      profile,
      lead: [pw.pathwayId, names.get(pw.pathwayId) ?? "", profile.profileId, profile.name, profile.peril, profile.region, profile.metric, profile.baselineWarming] as TableCell[],
    })),
  );
}

/** The first summary of each kind, to name the statistic columns. */
function firstSummary(perils: PerilResult, pick: (h: PerilResult["pathways"][number]["profiles"][number]["horizons"][number]) => PerilSummary | undefined) {
  for (const pw of perils.pathways) for (const p of pw.profiles) for (const h of p.horizons) {
    const s = pick(h);
    if (s) return s;
  }
  return undefined;
}

/**
 * The peril block as flat tables, one row per pathway, profile and horizon (and per baseline
 * return period or per portfolio row and loss measure). A result without a peril block gives
 * the header alone. Multipliers are dimensionless, return periods in years, losses in the
 * row's currency.
 */
export function perilTable(result: RunResult, table: PerilTable): Table {
  const perils: PerilResult = result.perils ?? { portfolioId: null, pathways: [], unmatchedRows: [] };
  const rows: TableCell[][] = [];
  switch (table) {
    case "peril-multipliers": {
      const keys = summaryKeys(firstSummary(perils, (h) => h.multiplier));
      for (const { profile, lead } of profileRows(result, perils))
        for (const h of profile.horizons)
          rows.push([
            ...lead,
            h.year,
            profile.multiplierReturnPeriod ?? null,
            ...keys.map((k) => h.multiplier[k] ?? null),
            ...keys.map((k) => h.tailMultipliers?.["100"][k] ?? null),
            ...keys.map((k) => h.tailMultipliers?.["200"][k] ?? null),
            returnPeriodList(profile.table?.returnPeriods),
            returnPeriodList(profile.table?.readOutside),
            h.beyondTable?.below ?? null,
            h.beyondTable?.above ?? null,
            beyondTableWarning(h.beyondTable, profile),
          ]);
      return {
        columns: [
          ...PROFILE_COLUMNS,
          "year",
          "multiplier_return_period_years",
          ...keys.map((k) => `multiplier_${k}`),
          ...keys.map((k) => `multiplier_100yr_${k}`),
          ...keys.map((k) => `multiplier_200yr_${k}`),
          "table_return_periods_years",
          "read_outside_tables",
          "share_below_table",
          "share_above_table",
          "beyond_table_warning",
        ],
        rows,
      };
    }
    case "peril-return-periods": {
      const keys = summaryKeys(firstSummary(perils, (h) => h.returnPeriods?.["100"]));
      for (const { profile, lead } of profileRows(result, perils))
        for (const h of profile.horizons) {
          if (!h.returnPeriods) continue;
          for (const base of ["100", "200"] as const)
            rows.push([
              ...lead,
              h.year,
              Number(base),
              ...keys.map((k) => h.returnPeriods![base][k] ?? null),
              profile.table ? (profile.table.readOutside.includes(Number(base)) ? "yes" : "no") : null,
            ]);
        }
      return {
        columns: [...PROFILE_COLUMNS, "year", "baseline_return_period_years", ...keys.map((k) => `return_period_${k}_years`), "read_outside_tables"],
        rows,
      };
    }
    case "peril-losses": {
      const keys = summaryKeys(firstSummary(perils, (h) => h.losses[0]?.aal));
      for (const { profile, lead } of profileRows(result, perils))
        for (const h of profile.horizons)
          for (const loss of h.losses)
            for (const measure of ["aal", "loss100", "loss200"] as const)
              rows.push([...lead, h.year, loss.currency, measure, ...keys.map((k) => loss[measure][k] ?? null)]);
      return { columns: [...PROFILE_COLUMNS, "year", "currency", "measure", ...keys.map((k) => `loss_${k}`)], rows };
    }
  }
}
