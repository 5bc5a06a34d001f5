import {
  AGENT_LABELS,
  FORCING_AGENTS,
  PERIL_RULES,
  PORTFOLIO_TOTAL_NOTES,
  RESULT_CAUTIONS,
  formatFixed,
  formatKelvin,
  formatMoney,
  formatProbability,
  formatUtcDateTime,
  inputLabel,
  moneyScale,
  moneyUnit,
  percentileHeading,
  type MoneyScale,
  type PathwayResult,
  type RunResult,
} from "@plumeline/contracts";
import { perilWarnings } from "../peril-profiles/peril-warnings.js";
import type { WorkbookManifest } from "../exports/workbook-builder.js";
import { drawBarChart } from "./pdf-bar-chart.js";
import { drawExceedanceChart } from "./pdf-exceedance-chart.js";
import { drawFanChart } from "./pdf-fan-chart.js";
import { drawRangeChart } from "./pdf-range-chart.js";
import { ACCENT, AGENT_COLORS, INK, seriesColor, thresholdStyle } from "./report-style.js";
import { ReportWriter, type Column } from "./report-writer.js";

const percentileKeys = (set: Record<string, unknown>) =>
  Object.keys(set)
    .filter((k) => /^p\d+(\.\d+)?$/.test(k))
    .sort((a, b) => Number(a.slice(1)) - Number(b.slice(1)));
const byNumber = (a: string, b: string) => Number(a) - Number(b);
const year = (v: number | null | undefined) => (v === null || v === undefined || !Number.isFinite(v) ? "–" : String(Math.round(v)));
// The one way Plumeline writes a time (UTC, to the minute, saying so), as on screen and in the workbook.
const date = (iso: string | null) => (iso ? formatUtcDateTime(iso) : "–");

/**
 * The run report as a PDF a board or supervisor reads: what the run is for, which model
 * version made it and whether it was approved (stamped on every page), the pathways and their
 * sources, per pathway the charts (fan, exceedance, crossing years, forcing by agent,
 * sensitivity) and the horizon tables, the peril lens and portfolio totals when the run has
 * them, the reliance and limitation statements, the cautions, and the manifest with the
 * hashes. Figures are written by the same rules as on screen (contracts' formatters); charts
 * are vector paths; all text is real text (embedded fonts), so it can be searched and copied.
 * Built from stored data only, with fixed metadata, so the same export rebuilds byte for byte.
 */
export async function buildRunReport(manifest: WorkbookManifest, result: RunResult, spec: { perils?: unknown }): Promise<Buffer> {
  const w = await ReportWriter.open(
    {
      title: manifest.runName,
      exploratory: manifest.exploratory,
      foot: `Run ${manifest.runId.slice(0, 8)} · engine ${manifest.engineVersion} · result hash ${manifest.resultHash.slice(0, 16)}…`,
    },
    new Date(manifest.exportedAt),
  );
  cover(w, manifest, result, Boolean(spec.perils));
  result.pathways.forEach((p, i) => pathwaySection(w, manifest, result, p, i));
  if (result.perils) perilSection(w, result);
  closing(w, manifest, result);
  return w.finish();
}

function cover(w: ReportWriter, m: WorkbookManifest, result: RunResult, hasPerils: boolean): void {
  w.h1(`Run report: ${m.runName}`);
  w.paragraph(`Prepared ${date(m.exportedAt)} by ${m.exportedBy} from run ${m.runId}.`, { muted: true, size: 8.5 });
  w.banner(
    m.exploratory
      ? `EXPLORATORY — made with model version “${m.modelVersion.name} v${m.modelVersion.versionNumber}”, which was not approved when the run was made. These results are not for filings.`
      : `APPROVED — made with model version “${m.modelVersion.name} v${m.modelVersion.versionNumber}”, approved under the firm's model governance.`,
    m.exploratory ? "danger" : "ok",
  );
  w.h2("Purpose");
  w.paragraph(
    `This report sets out the range of global mean warming that the model version gives for ${m.pathways.length === 1 ? "one pathway" : `${m.pathways.length} pathways`}` +
      `${hasPerils ? ", and what that warming means for the firm's peril profiles and portfolio baseline" : ""}, for scenario analysis (for example in the ORSA). ` +
      `Percentiles describe physical-climate uncertainty given each pathway — they are not the chance of the pathway — from an ensemble of ${m.members.toLocaleString("en-GB")} members` +
      `${result.effectiveMembers < m.members - 0.5 ? ` weighted by observed warming (effective members ${Math.round(result.effectiveMembers).toLocaleString("en-GB")})` : ""}.`,
  );
  w.h2("Model version and approval");
  w.keyValues([
    ["Model version", `${m.modelVersion.name} v${m.modelVersion.versionNumber}`],
    ["Status when reported", m.modelVersion.status],
    ["Run made with", m.exploratory ? "an unapproved version (exploratory)" : "an approved version"],
    ["Change class", m.modelVersion.changeClass ?? "–"],
    ["Decided by", m.modelVersion.decidedBy ?? "–"],
    ["Decided at", date(m.modelVersion.decidedAt)],
    ["Run made by", m.createdBy],
    ["Run finished", date(m.finishedAt)],
  ]);
  w.h2("Pathways and their sources");
  w.table(
    [
      { label: "Pathway", width: 120 },
      { label: "Source", width: 200 },
      { label: "Vintage", width: 70 },
      { label: "Years", width: 62, align: "right" },
    ],
    m.pathways.map((p) => [p.name, p.source, p.vintage, `${p.startYear}–${p.endYear}`]),
  );
  w.paragraph("Each pathway's SHA-256 checksum is listed in the manifest at the end of this report.", { muted: true, size: 8 });
}

function pathwaySection(w: ReportWriter, m: WorkbookManifest, result: RunResult, p: PathwayResult, index: number): void {
  w.newPage();
  w.h1(`Warming — ${p.name}`);
  const baseline = `${m.baseline[0]}–${m.baseline[1]}`;
  w.paragraph(
    `Global mean surface temperature anomaly against ${baseline} (K). Filled: ${p.name}, median with 17th–83rd and 5th–95th percentile bands` +
      `${result.pathways.length > 1 ? "; lines: the other pathways' medians" : ""}. Dashed lines: the warming thresholds.`,
    { muted: true, size: 8.5 },
  );
  const others = result.pathways.map((q, i) => ({ q, i })).filter(({ q }) => q.id !== p.id);
  const fan = (q: PathwayResult, i: number, bands: boolean) => ({
    name: q.name,
    color: seriesColor(i),
    years: q.years,
    p5: q.temperature.p5 ?? q.temperature.p50!,
    p17: q.temperature.p17 ?? q.temperature.p50!,
    p50: q.temperature.p50!,
    p83: q.temperature.p83 ?? q.temperature.p50!,
    p95: q.temperature.p95 ?? q.temperature.p50!,
    bands,
  });
  if (p.temperature.p50) {
    const top = w.reserve(0);
    const used = drawFanChart(w.doc, { x: w.left, y: top, width: w.width, height: 230 }, {
      series: [fan(p, index, true), ...others.filter(({ q }) => q.temperature.p50).map(({ q, i }) => fan(q, i, false))],
      thresholds: m.thresholds,
      yLabel: `Warming above ${baseline} (K)`,
      fromYear: m.baseline[0],
    });
    w.doc.y = top + used + 6;
  }
  horizonTable(w, p);
  w.h3(`Chance of exceeding each threshold — ${p.name}`, 200);
  const thresholds = Object.keys(p.exceedance).sort(byNumber);
  const top = w.reserve(190);
  const used = drawExceedanceChart(w.doc, { x: w.left, y: top, width: w.width, height: 170 }, {
    years: p.years,
    curves: thresholds.map((t) => ({ threshold: Number(t), probability: p.exceedance[t]! })),
  });
  w.doc.y = top + used + 4;
  crossing(w, p, baseline);
  forcingAndSensitivity(w, p);
}

function horizonTable(w: ReportWriter, p: PathwayResult): void {
  const first = p.horizons[0];
  if (!first) return;
  const keys = percentileKeys(first.temperature);
  const thresholds = Object.keys(first.exceedance).sort(byNumber);
  const columns: Column[] = [
    { label: "Horizon", width: 42 },
    ...keys.map((k) => ({ label: `${percentileHeading(k)} (K)`, width: 44, align: "right" as const })),
    ...thresholds.map((t) => ({ label: `Chance > ${t} K`, width: 60, align: "right" as const })),
    { label: "Committed, median (K)", width: 66, align: "right" },
  ];
  w.table(
    columns,
    p.horizons.map((h) => [
      String(h.year),
      ...keys.map((k) => formatKelvin(h.temperature[k])),
      ...thresholds.map((t) => formatProbability(h.exceedance[t])),
      formatKelvin(h.committed.p50),
    ]),
    { caption: `Warming at the horizons — ${p.name}`, boldColumn: 1 + keys.indexOf("p50") },
  );
  w.paragraph("Chance > T: share of members warmer than T in that year. Committed: further warming (median) if forcing stayed at that year's level — the equilibrium warming F/λ minus the warming since the pathway start.", {
    muted: true,
    size: 8,
  });
}

function crossing(w: ReportWriter, p: PathwayResult, baseline: string): void {
  const thresholds = Object.keys(p.crossing).sort(byNumber);
  if (thresholds.length === 0) return;
  w.h3(`First year above each threshold — ${p.name}`, thresholds.length * 16 + 44);
  const top = w.reserve(thresholds.length * 16 + 44);
  const used = drawRangeChart(w.doc, { x: w.left, y: top, width: w.width }, {
    rows: thresholds.map((t, k) => {
      const c = p.crossing[t]!;
      return { label: `above ${t} K`, color: thresholdStyle(k).color, p5: c.p5 ?? null, p17: c.p17 ?? null, p50: c.p50 ?? null, p83: c.p83 ?? null, p95: c.p95 ?? null, note: `never ${formatProbability(c.never)}` };
    }),
    axisLabel: "Year of first crossing (box 17–83 %, whiskers 5–95 %, bar median)",
    format: (v) => String(v),
    labelWidth: 80,
  });
  w.doc.y = top + used + 2;
  const keys = percentileKeys(p.crossing[thresholds[0]!]!);
  w.table(
    [{ label: "Threshold", width: 60 }, ...keys.map((k) => ({ label: percentileHeading(k), width: 50, align: "right" as const })), { label: "Never crosses", width: 60, align: "right" }],
    thresholds.map((t) => {
      const c = p.crossing[t]!;
      return [`${t} K`, ...keys.map((k) => year(c[k])), formatProbability(c.never)];
    }),
    { caption: `First-crossing years — ${p.name}` },
  );
  w.paragraph(
    `Crossing rule: a member crosses in the first year its annual warming (against ${baseline}) is above the threshold; “never” counts members that stay at or below it up to ${p.years.at(-1)}. A percentile shows “–” when fewer members than that percentile cross.`,
    { muted: true, size: 8 },
  );
}

function forcingAndSensitivity(w: ReportWriter, p: PathwayResult): void {
  const h = p.horizons.at(-1);
  if (!h) return;
  const agents = FORCING_AGENTS.filter((a) => h.forcingByAgent[a]);
  if (agents.length > 0) {
    w.h3(`Forcing by agent in ${h.year} — ${p.name}`, (agents.length + 1) * 16 + 44);
    const rows = agents.map((a) => {
      const s = h.forcingByAgent[a]!;
      return { label: AGENT_LABELS[a], color: AGENT_COLORS[a], p5: s.p5 ?? s.p50 ?? null, p50: s.p50 ?? null, p95: s.p95 ?? s.p50 ?? null, note: formatFixed(s.p50 ?? 0, 2) };
    });
    if (h.forcing.p50 !== undefined)
      rows.push({ label: "Total", color: INK, p5: h.forcing.p5 ?? h.forcing.p50, p50: h.forcing.p50, p95: h.forcing.p95 ?? h.forcing.p50, note: formatFixed(h.forcing.p50, 2) });
    const top = w.reserve(rows.length * 16 + 44);
    const used = drawRangeChart(w.doc, { x: w.left, y: top, width: w.width }, {
      rows,
      axisLabel: "Effective radiative forcing (W m-2): bar median, whiskers 5–95 %; median at right",
      format: (v) => formatFixed(v, 1),
      zeroLine: true,
      labelWidth: 130,
    });
    w.doc.y = top + used + 4;
  }
  const bars = p.sensitivity.filter((s) => s.horizon === h.year);
  if (bars.length > 0) {
    w.h3(`Sensitivity budget in ${h.year} — ${p.name}`, bars.length * 15 + 44);
    const top = w.reserve(bars.length * 15 + 44);
    const used = drawBarChart(w.doc, { x: w.left, y: top, width: w.width }, {
      bars: bars.map((s) => {
        const share = (s as { varianceShare?: number }).varianceShare;
        return { label: inputLabel(s.input), value: s.index, note: share === undefined ? formatFixed(s.index, 2) : `${formatFixed(s.index, 2)} · ${formatFixed(share * 100, 0)} % var.` };
      }),
      axisLabel: "Rank correlation with warming (−1 to 1); variance share at right where the engine reports it",
      domain: [-1, 1],
      color: ACCENT,
      format: (v) => formatFixed(v, 1),
    });
    w.doc.y = top + used + 4;
  }
}

function perilSection(w: ReportWriter, result: RunResult): void {
  const perils = result.perils!;
  w.newPage();
  w.h1("Peril lens");
  w.paragraph("How each peril profile turns this run's warming into multipliers of the firm's own view of risk and into projected losses, member by member.", { muted: true, size: 8.5 });
  w.bullets(PERIL_RULES, { size: 8 });
  const names = new Map(result.pathways.map((p) => [p.id, p.name]));
  for (const pw of perils.pathways) {
    w.h2(`Multipliers — ${names.get(pw.pathwayId) ?? pw.pathwayId}`);
    const rows = pw.profiles.flatMap((profile) =>
      profile.horizons.map((h) => [
        profile.name,
        String(h.year),
        formatFixed(h.multiplier.p5 ?? Number.NaN, 3),
        formatFixed(h.multiplier.p50 ?? Number.NaN, 3),
        formatFixed(h.multiplier.p95 ?? Number.NaN, 3),
        h.returnPeriods ? formatFixed(h.returnPeriods["100"].p50 ?? Number.NaN, 1) : "–",
        h.beyondTable ? `${formatFixed((h.beyondTable.below + h.beyondTable.above) * 100, 1)} %` : "–",
      ]),
    );
    w.table(
      [
        { label: "Profile", width: 150 },
        { label: "Horizon", width: 46 },
        { label: "5th pct", width: 50, align: "right" },
        { label: "50th pct", width: 50, align: "right" },
        { label: "95th pct", width: 50, align: "right" },
        { label: "Today's 1-in-100 becomes 1-in- (median, years)", width: 90, align: "right" },
        { label: "Members beyond the table", width: 54, align: "right" },
      ],
      rows,
      { boldColumn: 3 },
    );
    if (pw.totals && pw.totals.length > 0) totalsTable(w, pw.totals, names.get(pw.pathwayId) ?? pw.pathwayId);
  }
  const warnings = perilWarnings(result);
  if (warnings.length > 0) {
    w.h3("Peril lens warnings");
    w.bullets(warnings, { size: 8 });
  }
  if (perils.totalsRefused) w.paragraph(`No portfolio totals: ${perils.totalsRefused}.`);
  if (perils.unmatchedRows.length > 0)
    w.paragraph(`Portfolio rows no profile projects (entered in the totals unchanged): ${perils.unmatchedRows.map((r) => `${r.region} — ${r.peril}`).join("; ")}.`, { size: 8.5 });
  if (perils.pathways.some((p) => p.totals?.length)) {
    w.h3("What the portfolio totals are");
    w.bullets(PORTFOLIO_TOTAL_NOTES, { size: 8 });
  }
}

function totalsTable(w: ReportWriter, totals: NonNullable<NonNullable<RunResult["perils"]>["pathways"][number]["totals"]>, pathwayName: string): void {
  for (const total of totals) {
    const keys = percentileKeys(total.horizons[0]?.aal ?? {});
    const scale = moneyScale(total.horizons.flatMap((h) => [h.aal, h.loss100, h.loss200].flatMap((s) => keys.map((k) => s[k]))).concat([total.baseline.loss200]));
    const unit = moneyUnit(total.currency, scale);
    const metrics = [
      ["aal", "Average annual loss"],
      ["loss100", "1-in-100 loss"],
      ["loss200", "1-in-200 loss"],
    ] as const;
    w.table(
      [
        { label: "Horizon", width: 44 },
        { label: "Measure", width: 96 },
        { label: "Today", width: 52, align: "right" },
        ...keys.map((k) => ({ label: percentileHeading(k), width: 52, align: "right" as const })),
        { label: "Median change", width: 60, align: "right" },
      ],
      total.horizons.flatMap((h) =>
        metrics.map(([field, label]) => [
          String(h.year),
          label,
          formatMoney(total.baseline[field], scale),
          ...keys.map((k) => formatMoney(h[field][k], scale)),
          formatChange((h[field].p50 ?? Number.NaN) - total.baseline[field], total.baseline[field], scale),
        ]),
      ),
      {
        caption: `Portfolio totals — ${pathwayName}, amounts in ${unit} (${total.rows} rows, ${total.projectedRows} projected by a profile)`,
        boldColumn: 3 + keys.indexOf("p50"),
      },
    );
  }
}

/**
 * A change written to the decimals of the figure it changes (today's total at three
 * significant figures): the difference of two such figures is good to no more decimals.
 */
function formatChange(change: number, today: number, scale: MoneyScale): string {
  const decimals = (formatMoney(today, scale).split(".")[1] ?? "").length;
  if (!Number.isFinite(change)) return "–";
  const text = formatFixed(change / scale.divisor, decimals);
  return change > 0 && Number(text) !== 0 ? `+${text}` : text === `-${formatFixed(0, decimals)}` ? formatFixed(0, decimals) : text;
}

function closing(w: ReportWriter, m: WorkbookManifest, result: RunResult): void {
  w.newPage();
  w.h1("Reliance, limitations and cautions");
  w.h2("Reliance and limitation statements recorded with this run");
  if (m.statements.length === 0) w.paragraph("None recorded.", { muted: true });
  for (const s of m.statements) {
    w.h3(`${s.kind === "reliance" ? "Reliance" : "Limitation"} — ${s.by}, ${date(s.at)}`);
    w.paragraph(s.text);
  }
  w.h2("Cautions — read before using these results");
  w.bullets(RESULT_CAUTIONS);
  w.h2("Manifest");
  w.keyValues([
    ["Run", `${m.runName} (${m.runId})`],
    ["Model version", `${m.modelVersion.name} v${m.modelVersion.versionNumber} (${m.modelVersion.id})`],
    ["Engine version", m.engineVersion],
    ["Input hash", m.inputHash, { mono: true }],
    ["Result hash", m.resultHash, { mono: true }],
    ["Seed", m.seed, { mono: true }],
    ["Members", m.members.toLocaleString("en-GB")],
    ["Effective members", formatFixed(result.effectiveMembers, 1)],
    ["Sampling", m.sampling],
    ["Baseline period", `${m.baseline[0]}–${m.baseline[1]}`],
    ["Percentiles", m.percentiles.join(", ")],
    ["Thresholds (K)", m.thresholds.join(", ")],
    ["Horizons", m.horizons.join(", ")],
    ["Prepared by", m.exportedBy],
    ["Prepared at", date(m.exportedAt)],
  ]);
  w.table(
    [
      { label: "Pathway", width: 130 },
      { label: "Checksum (SHA-256)", width: 370, mono: true },
    ],
    m.pathways.map((p) => [p.name, p.checksum]),
    { caption: "Pathway checksums" },
  );
}
