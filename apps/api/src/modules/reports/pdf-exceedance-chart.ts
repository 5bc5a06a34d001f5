import { scaleLinear } from "d3-scale";
import { line as lineShape } from "d3-shape";
import { bottomAxis, leftAxis, legend, plotArea, type Box } from "./pdf-axes.js";
import { thresholdStyle } from "./report-style.js";

/**
 * First year worth showing: ten years before any curve first reaches 0.5 %, so the axis
 * starts where the data starts instead of spending most of its width on a flat zero.
 */
export function exceedanceStartYear(years: number[], curves: number[][]): number {
  let first = years.length - 1;
  for (const c of curves) {
    const k = c.findIndex((p) => p >= 0.005);
    if (k >= 0) first = Math.min(first, k);
  }
  return Math.max(years[0]!, years[first]! - 10);
}

/** Chance of exceeding each threshold by year, one line per threshold (blues, own dash). */
export function drawExceedanceChart(doc: PDFKit.PDFDocument, box: Box, options: { years: number[]; curves: Array<{ threshold: number; probability: number[] }> }): number {
  const area = plotArea(box);
  const { years, curves } = options;
  const from = exceedanceStartYear(years, curves.map((c) => c.probability));
  const to = years.at(-1)!;
  const x = scaleLinear().domain([from, to]).range([0, area.width]);
  const y = scaleLinear().domain([0, 1]).range([area.height, 0]);
  leftAxis(doc, area, y, "Chance of exceeding (%)", (v) => `${Math.round(v * 100)}`);
  const idx = years.map((yr, i) => [yr, i] as const).filter(([yr]) => yr >= from).map(([, i]) => i);
  doc.save();
  doc.translate(area.x, area.y);
  curves.forEach((c, k) => {
    const style = thresholdStyle(k);
    const d = lineShape<number>()
      .x((i) => x(years[i]!))
      .y((i) => y(c.probability[i]!))(idx) ?? "";
    doc.path(d).lineWidth(1.6).strokeColor(style.color).dash(style.dash[0]! + 2, { space: style.dash[1]! }).stroke().undash();
  });
  doc.restore();
  bottomAxis(doc, area, x, "Year", (v) => String(v));
  const used = legend(
    doc,
    box.x + 46,
    box.y + box.height + 2,
    box.width - 46,
    curves.map((c, k) => ({ label: `above ${c.threshold} K`, color: thresholdStyle(k).color, kind: "line" as const, dash: [thresholdStyle(k).dash[0]! + 2, thresholdStyle(k).dash[1]!] })),
  );
  return box.height + used + 4;
}
