import { PORTFOLIO_TOTAL_NOTES, type PortfolioTotal } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { formatMoney, moneyScale, moneyUnit, percentileHeading, type MoneyScale } from "@/lib/format";

const MEASURES = [
  ["aal", "Average annual loss"],
  ["loss100", "1-in-100 loss"],
  ["loss200", "1-in-200 loss"],
] as const;

const percentileKeys = (s: Record<string, number> | undefined) =>
  Object.keys(s ?? {})
    .filter((k) => /^p\d/.test(k))
    .sort((a, b) => Number(a.slice(1)) - Number(b.slice(1)));

/** A change written to the decimals of the figure it changes (today's total at three significant figures). */
export function formatChange(change: number, today: number, scale: MoneyScale): string {
  if (!Number.isFinite(change)) return "–";
  const decimals = (formatMoney(today, scale).split(".")[1] ?? "").length;
  const text = (change / scale.divisor).toFixed(decimals);
  if (Number(text) === 0) return (0).toFixed(decimals);
  return change > 0 ? `+${text}` : text;
}

/**
 * The portfolio totals of one pathway: per currency, today's total and the percentiles of the
 * member-by-member totals at each horizon, with the median's change against today; amounts in
 * the currency with one scale per table (EUR m) at three significant figures, and beside them
 * what the totals are and are not (no diversification credit; defer to the capital model).
 */
export function PortfolioTotals({ totals, refused }: { totals: PortfolioTotal[] | undefined; refused?: string | undefined }) {
  if (refused) return <p className="text-sm text-muted">No portfolio totals: {refused}.</p>;
  if (!totals || totals.length === 0) return null;
  return (
    <section aria-labelledby="portfolio-totals-heading" className="flex flex-col gap-3">
      <h3 id="portfolio-totals-heading" className="text-sm font-semibold text-ink">
        Portfolio totals
      </h3>
      {totals.length > 1 && (
        <p className="text-sm text-ember-800">This portfolio holds rows in {totals.map((t) => t.currency).join(" and ")}: one total per currency, never added together.</p>
      )}
      <div className="grid gap-4 xl:grid-cols-[3fr_1fr]">
        <div className="flex flex-col gap-4">
          {totals.map((total) => {
            const keys = percentileKeys(total.horizons[0]?.aal);
            const scale = moneyScale([total.baseline.loss200, ...total.horizons.flatMap((h) => keys.map((k) => h.loss200[k]))]);
            const unit = moneyUnit(total.currency, scale);
            return (
              <div key={total.currency}>
                <p className="mb-1 text-xs text-muted">
                  Amounts in <span className="font-semibold text-ink">{unit}</span> · {total.rows} rows, {total.projectedRows} projected by a peril profile
                </p>
                <Table aria-label={`Portfolio totals (${total.currency})`}>
                  <thead>
                    <tr>
                      <Th>Horizon</Th>
                      <Th>Measure</Th>
                      <Th numeric>Today</Th>
                      {keys.map((k) => (
                        <Th key={k} numeric>
                          {percentileHeading(k)}
                        </Th>
                      ))}
                      <Th numeric>Median change</Th>
                    </tr>
                  </thead>
                  <tbody>
                    {total.horizons.flatMap((h) =>
                      MEASURES.map(([field, label]) => (
                        <tr key={`${h.year}-${field}`}>
                          <Td>{h.year}</Td>
                          <Td>{label}</Td>
                          <Td numeric className="text-muted">
                            {formatMoney(total.baseline[field], scale)}
                          </Td>
                          {keys.map((k) => (
                            <Td key={k} numeric className={k === "p50" ? "font-semibold text-ink" : undefined}>
                              {formatMoney(h[field][k], scale)}
                            </Td>
                          ))}
                          <Td numeric>{formatChange((h[field].p50 ?? Number.NaN) - total.baseline[field], total.baseline[field], scale)}</Td>
                        </tr>
                      )),
                    )}
                  </tbody>
                </Table>
              </div>
            );
          })}
        </div>
        <aside aria-label="What the portfolio totals are" className="rounded-md border border-line border-l-4 border-l-accent px-3 py-2 text-xs text-text">
          <ul className="list-disc space-y-1 pl-4">
            {PORTFOLIO_TOTAL_NOTES.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </aside>
      </div>
    </section>
  );
}
