import { useState } from "react";
import { PERIL_RULES, type PerilProfileResult, type PerilResult, type PerilSummary, type PortfolioRow } from "@plumeline/contracts";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { PanelErrorBoundary } from "@/components/ui/panel-error-boundary";
import { Segmented } from "@/components/ui/segmented";
import { EmptyState } from "@/components/ui/states";
import { Table, Td, Th } from "@/components/ui/table";
import { PercentileNote } from "@/components/ui/percentile-note";
import { formatMoney, formatNumber, moneyScale, moneyUnit, percentileHeading } from "@/lib/format";
import { AalBandChart } from "./aal-band-chart";
import { PortfolioTotals } from "./portfolio-totals";
import { TableReach } from "./table-reach";

/** The peril cautions in plain words (the peril lens's limits, as README "Cautions" states them). */
export const PERIL_CAUTIONS = [
  "Not a catastrophe model: these multipliers adjust the firm's own view of risk; they do not replace it.",
  "Scaling factors differ by region and by return period (rarer events can change more in frequency).",
  "Multipliers apply only to warming beyond the baseline warming already in the firm's risk view.",
  "Exposure growth and adaptation are not included.",
] as const;

/** "p5", "p17", … in numeric order, then "mean". */
export function summaryKeys(s: PerilSummary | undefined): string[] {
  if (!s) return [];
  const keys = Object.keys(s).filter((k) => k.startsWith("p")).sort((a, b) => Number(a.slice(1)) - Number(b.slice(1)));
  return "mean" in s ? [...keys, "mean"] : keys;
}
const keyLabel = (k: string) => (k === "mean" ? "Mean" : percentileHeading(k));

function SummaryTable({
  caption,
  rows,
  format,
  lead,
}: {
  caption: string;
  lead: string[];
  rows: Array<{ id: string; lead: Array<string | number>; summary: PerilSummary }>;
  format: (v: number | undefined) => string;
}) {
  const keys = summaryKeys(rows[0]?.summary);
  return (
    <Table aria-label={caption}>
      <thead>
        <tr>
          {lead.map((l) => (
            <Th key={l}>{l}</Th>
          ))}
          {keys.map((k) => (
            <Th key={k} numeric>
              {keyLabel(k)}
            </Th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.id}>
            {r.lead.map((v, i) => (
              <Td key={i} className={i === 0 ? "font-medium" : undefined}>
                {v}
              </Td>
            ))}
            {keys.map((k) => (
              <Td key={k} numeric className={k === "p50" ? "font-semibold" : undefined}>
                {format(r.summary[k])}
              </Td>
            ))}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}

function ProfileSection({ profile, baselineRows }: { profile: PerilProfileResult; baselineRows: PortfolioRow[] }) {
  const frequency = profile.metric === "frequency";
  const losses = profile.horizons[0]?.losses ?? [];
  return (
    <div className="flex flex-col gap-5">
      <p className="text-sm text-muted">
        {profile.peril} · {profile.region} · {frequency ? "frequency (shifts return periods)" : "severity (scales losses)"} · warming already in the risk view{" "}
        <span className="num text-text">{profile.baselineWarming.toFixed(2)} K</span>
      </p>
      <section>
        <h3 className="mb-2 text-sm font-semibold text-ink">
          Multiplier at each horizon{profile.multiplierReturnPeriod ? ` (${profile.multiplierReturnPeriod}-year events; the AAL uses it)` : ""}
        </h3>
        <SummaryTable
          caption={`Multipliers — ${profile.name}`}
          lead={["Horizon"]}
          rows={profile.horizons.map((h) => ({ id: String(h.year), lead: [h.year], summary: h.multiplier }))}
          format={(v) => formatNumber(v, 3)}
        />
        <PercentileNote>
          A multiplier of 1.05 means the {frequency ? "event frequency" : "loss"} is 5 % above the baseline figure in the firm's risk view.
        </PercentileNote>
      </section>
      {profile.multiplierReturnPeriod && profile.horizons[0]?.tailMultipliers && (
        <section>
          <h3 className="mb-2 text-sm font-semibold text-ink">Multipliers of today's 1-in-100 and 1-in-200 events</h3>
          <SummaryTable
            caption={`Tail multipliers — ${profile.name}`}
            lead={["Horizon", "Today"]}
            rows={profile.horizons.flatMap((h) =>
              h.tailMultipliers ? (["100", "200"] as const).map((t) => ({ id: `${h.year}-${t}`, lead: [h.year, `1-in-${t}`], summary: h.tailMultipliers![t] })) : [],
            )}
            format={(v) => formatNumber(v, 3)}
          />
        </section>
      )}
      <TableReach profile={profile} />
      {frequency && (
        <section>
          <h3 className="mb-2 text-sm font-semibold text-ink">Return periods of today's 1-in-100 and 1-in-200 events (years)</h3>
          <SummaryTable
            caption={`Return periods — ${profile.name}`}
            lead={["Horizon", "Today"]}
            rows={profile.horizons.flatMap((h) =>
              h.returnPeriods ? (["100", "200"] as const).map((t) => ({ id: `${h.year}-${t}`, lead: [h.year, `1-in-${t}`], summary: h.returnPeriods![t] })) : [],
            )}
            format={(v) => formatNumber(v, 1)}
          />
        </section>
      )}
      {losses.length === 0 ? (
        <p className="text-sm text-muted">No portfolio row with this peril and region: no losses projected.</p>
      ) : (
        losses.map((loss, li) => {
          const baseline = baselineRows.find((r) => r.region === loss.region && r.peril === loss.peril);
          // One scale per table, from its largest figure, so every amount reads in the same unit.
          const scale = moneyScale(profile.horizons.flatMap((h) => (h.losses[li] ? Object.values(h.losses[li]!.loss200) : [])));
          return (
            <section key={`${loss.region}-${loss.peril}`} className="flex flex-col gap-3">
              <h3 className="text-sm font-semibold text-ink">
                Projected losses — {loss.region}, {loss.peril} ({moneyUnit(loss.currency, scale)})
              </h3>
              <SummaryTable
                caption={`Projected losses — ${loss.region} ${loss.peril}`}
                lead={["Horizon", "Measure"]}
                rows={profile.horizons.flatMap((h) => {
                  const l = h.losses[li];
                  if (!l) return [];
                  return [
                    { id: `${h.year}-aal`, lead: [h.year, "Average annual loss"], summary: l.aal },
                    { id: `${h.year}-100`, lead: [h.year, "1-in-100 loss"], summary: l.loss100 },
                    { id: `${h.year}-200`, lead: [h.year, "1-in-200 loss"], summary: l.loss200 },
                  ];
                })}
                format={(v) => formatMoney(v, scale)}
              />
              <p className="-mt-1 text-xs text-muted">
                Amounts in {moneyUnit(loss.currency, scale)} at three significant figures (the CSV and workbook keep full precision): the portfolio's baseline figures times each member's multiplier, summarised by the same percentiles; exposure growth not included.
              </p>
              <PanelErrorBoundary resetKey={`${profile.profileId}-${li}`}>
                <AalBandChart
                  title={`Projected AAL by horizon — ${loss.region}, ${loss.peril}`}
                  currency={loss.currency}
                  baselineAal={baseline?.aal ?? null}
                  horizons={profile.horizons.flatMap((h) => (h.losses[li] ? [{ year: h.year, summary: h.losses[li]!.aal }] : []))}
                />
              </PanelErrorBoundary>
            </section>
          );
        })
      )}
    </div>
  );
}

/**
 * The peril lens part of a run's result: per pathway and profile, multiplier percentiles,
 * shifted return periods and projected losses at the horizons, a chart of projected AAL with
 * its bands, the portfolio rows no profile matched, and the peril cautions. Takes the result's
 * `perils` block as plain data (and, optionally, the portfolio rows of the run's spec for
 * today's AAL and the pathway names), so it is tested with fixtures and never fetches.
 */
export function PerilResults({
  result,
  pathwayNames = {},
  baselineRows = [],
}: {
  result: PerilResult;
  pathwayNames?: Record<string, string>;
  baselineRows?: PortfolioRow[];
}) {
  const [pathwayId, setPathwayId] = useState(result.pathways[0]?.pathwayId ?? "");
  const pathway = result.pathways.find((p) => p.pathwayId === pathwayId) ?? result.pathways[0];
  const [profileId, setProfileId] = useState(pathway?.profiles[0]?.profileId ?? "");
  const profile = pathway?.profiles.find((p) => p.profileId === profileId) ?? pathway?.profiles[0];

  return (
    <Card aria-labelledby="peril-lens-heading">
      <CardHeader
        id="peril-lens-heading"
        title="Peril lens"
        subtitle="How each peril profile turns this run's warming into multipliers, return periods and projected losses, member by member."
      />
      <CardBody className="flex flex-col gap-5">
        <aside aria-label="Peril cautions" className="rounded-md border border-line border-l-4 border-l-ember-400 px-4 py-3 text-sm">
          <ul className="list-disc space-y-0.5 pl-5">
            {PERIL_CAUTIONS.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
          <details className="mt-2">
            <summary className="cursor-pointer text-sm font-medium text-accent">How the multipliers were applied</summary>
            <ol className="mt-1 list-decimal space-y-1 pl-5 text-text">
              {PERIL_RULES.map((r) => (
                <li key={r}>{r}</li>
              ))}
            </ol>
          </details>
        </aside>

        {!pathway || !profile ? (
          <EmptyState title="No peril profiles in this run">Start a run with peril profiles (and a portfolio) to see multipliers and projected losses here.</EmptyState>
        ) : (
          <>
            {result.pathways.length > 1 && (
              <div className="flex flex-wrap items-center gap-3">
                <span className="text-sm font-medium text-ink">Pathway</span>
                <Segmented
                  label="Pathway for the peril lens"
                  value={pathway.pathwayId}
                  onChange={setPathwayId}
                  options={result.pathways.map((p) => ({ value: p.pathwayId, label: pathwayNames[p.pathwayId] ?? p.pathwayId }))}
                />
              </div>
            )}
            <PortfolioTotals totals={pathway.totals} refused={result.totalsRefused} />
            <div className="flex flex-wrap items-center gap-3">
              <span className="text-sm font-medium text-ink">Profile</span>
              <Segmented label="Peril profile" value={profile.profileId} onChange={setProfileId} options={pathway.profiles.map((p) => ({ value: p.profileId, label: p.name }))} />
            </div>
            <ProfileSection profile={profile} baselineRows={baselineRows} />
          </>
        )}

        {result.unmatchedRows.length > 0 && (
          <section aria-label="Portfolio rows not projected" className="rounded-md bg-surface-2 px-4 py-3 text-sm">
            <p className="font-medium text-ink">Portfolio rows not projected (no profile with the same peril and region):</p>
            <ul className="mt-1 list-disc pl-5">
              {result.unmatchedRows.map((r) => (
                <li key={`${r.region}-${r.peril}`}>
                  {r.region} — {r.peril}
                </li>
              ))}
            </ul>
          </section>
        )}
      </CardBody>
    </Card>
  );
}
