import { BEYOND_TABLE_WARNING_SHARE, type PerilProfileResult } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { formatProbability } from "@/lib/format";

const periods = (values: readonly number[]) => values.map((v) => `${v}-year`).join(" and ");

/**
 * Where a table profile's numbers come from and where they stop: which event return periods
 * its tables belong to, which table AAL uses, which reported return periods are read beyond
 * the tables, and — per horizon — the share of members whose warming lies beyond the table's
 * warming range (held or extrapolated there), with a warning above 5 %. Nothing for a
 * per-kelvin profile or a result from before tables stated their return period.
 */
export function TableReach({ profile }: { profile: PerilProfileResult }) {
  const table = profile.table;
  if (!table) return null;
  const [low, high] = table.warmingRange;
  const rule = table.beyondTable === "hold" ? "held at the table's end value" : "extrapolated from the end segment";
  const warned = profile.horizons.filter((h) => h.beyondTable && h.beyondTable.below + h.beyondTable.above > BEYOND_TABLE_WARNING_SHARE);
  return (
    <section aria-label={`Reach of the tables — ${profile.name}`} className="flex flex-col gap-2">
      <h3 className="text-sm font-semibold text-ink">Where the tables reach</h3>
      <p className="text-sm text-text">
        Tables for {periods(table.returnPeriods)} events.{" "}
        {profile.multiplierReturnPeriod !== null && profile.multiplierReturnPeriod !== undefined
          ? `The multiplier above and the AAL use the ${profile.multiplierReturnPeriod}-year table; `
          : "One multiplier serves every return period; "}
        {table.readOutside.length > 0
          ? `the 1-in-${table.readOutside.join(" and 1-in-")} figures lie beyond the tables' return periods and are read by ${
              table.beyondReturnPeriods === "hold" ? "holding the nearest table" : "continuing the end segment"
            }.`
          : "the 1-in-100 and 1-in-200 figures lie between the tables."}
      </p>
      {warned.length > 0 && (
        <p role="alert" className="rounded-md border border-line border-l-4 border-l-ember-400 px-3 py-2 text-sm">
          More than {BEYOND_TABLE_WARNING_SHARE * 100} % of members lie beyond the table's {low}–{high} K at{" "}
          {warned.map((h) => h.year).join(", ")}: their multipliers are {rule}, so the upper percentiles there say more about the table's end than about the
          warming.
        </p>
      )}
      <Table aria-label={`Members beyond the table — ${profile.name}`}>
        <thead>
          <tr>
            <Th>Horizon</Th>
            <Th numeric>Below {low} K</Th>
            <Th numeric>Above {high} K</Th>
          </tr>
        </thead>
        <tbody>
          {profile.horizons.map((h) => {
            const share = h.beyondTable;
            const over = share ? share.below + share.above > BEYOND_TABLE_WARNING_SHARE : false;
            return (
              <tr key={h.year}>
                <Td className="font-medium">{h.year}</Td>
                <Td numeric>{share ? formatProbability(share.below) : "–"}</Td>
                <Td numeric className={over ? "font-semibold text-danger" : undefined}>
                  {share ? formatProbability(share.above) : "–"}
                </Td>
              </tr>
            );
          })}
        </tbody>
      </Table>
      <p className="-mt-1 text-xs text-muted">
        Share of members (weighted under an observational constraint) whose warming at the horizon lies outside the warming range every table covers; their
        multipliers are {rule}.
      </p>
    </section>
  );
}
