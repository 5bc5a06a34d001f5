import { scaleLinear } from "d3-scale";
import { area as areaShape, line as lineShape } from "d3-shape";
import { bottomAxis, leftAxis, legend, plotArea, type Box } from "./pdf-axes.js";
import { thresholdStyle } from "./report-style.js";

export interface FanSeriesPdf {
  name: string;
  color: string;
  years: number[];
  p5: number[];
  p17: number[];
  p50: number[];
  p83: number[];
  p95: number[];
  /** Bands for the pathway in focus; the others show their median only, so the chart stays legible. */
  bands: boolean;
}

/**
 * The fan chart in vector form: the focused series' 5–95 % and 17–83 % bands and median, the
 * other series' medians, dashed threshold lines in Plumeline's blues. Years from `fromYear`.
 * Returns the height used (chart and legend).
 */
export function drawFanChart(
  doc: PDFKit.PDFDocument,
  box: Box,
  options: { series: FanSeriesPdf[]; thresholds: number[]; yLabel: string; fromYear: number },
): number {
  const area = plotArea(box);
  const from = options.fromYear;
  const to = Math.max(...options.series.map((s) => s.years.at(-1)!));
  const within = (s: FanSeriesPdf) => s.years.map((y, i) => [y, i] as const).filter(([y]) => y >= from && y <= to).map(([, i]) => i);
  let lo = 0;
  let hi = 0;
  for (const s of options.series)
    for (const i of within(s)) {
      lo = Math.min(lo, s.bands ? s.p5[i]! : s.p50[i]!);
      hi = Math.max(hi, s.bands ? s.p95[i]! : s.p50[i]!);
    }
  hi = Math.max(hi, ...options.thresholds.filter((t) => t <= hi * 1.15));
  const x = scaleLinear().domain([from, to]).range([0, area.width]);
  const y = scaleLinear().domain([lo, hi * 1.04]).range([area.height, 0]).nice();
  leftAxis(doc, area, y, options.yLabel, (v) => v.toFixed(1));
  doc.save();
  doc.translate(area.x, area.y);
  for (const s of options.series.filter((s) => s.bands)) {
    const idx = within(s);
    const band = (a: number[], b: number[]) =>
      areaShape<number>()
        .x((i) => x(s.years[i]!))
        .y0((i) => y(a[i]!))
        .y1((i) => y(b[i]!))(idx) ?? "";
    doc.path(band(s.p5, s.p95)).fillColor(s.color).fillOpacity(0.16).fill();
    doc.path(band(s.p17, s.p83)).fillColor(s.color).fillOpacity(0.32).fill();
    doc.fillOpacity(1);
  }
  options.thresholds.forEach((t, k) => {
    if (t < y.domain()[0]! || t > y.domain()[1]!) return;
    const style = thresholdStyle(k);
    doc.moveTo(0, y(t)).lineTo(area.width, y(t)).lineWidth(0.8).strokeColor(style.color).dash(style.dash[0]!, { space: style.dash[1]! }).stroke().undash();
    doc.font("sans").fontSize(7).fillColor(style.color).text(`${t} K`, 3, y(t) - 9, { lineBreak: false });
  });
  // Other series' medians first, the focused median last (on top).
  for (const s of [...options.series].sort((a, b) => Number(a.bands) - Number(b.bands))) {
    const idx = within(s);
    const median = lineShape<number>()
      .x((i) => x(s.years[i]!))
      .y((i) => y(s.p50[i]!))(idx) ?? "";
    doc.path(median).lineWidth(s.bands ? 1.8 : 1.3).strokeColor(s.color).stroke();
  }
  doc.restore();
  bottomAxis(doc, area, x, "Year", (v) => String(v));
  const items = options.series.flatMap((s) =>
    s.bands
      ? [
          { label: `${s.name}: median`, color: s.color, kind: "line" as const },
          { label: "17th–83rd percentile", color: s.color, kind: "band" as const },
          { label: "5th–95th percentile", color: s.color, kind: "band" as const },
        ]
      : [{ label: `${s.name}: median`, color: s.color, kind: "line" as const }],
  );
  const used = legend(doc, box.x + 46, box.y + box.height + 2, box.width - 46, items);
  return box.height + used + 4;
}
