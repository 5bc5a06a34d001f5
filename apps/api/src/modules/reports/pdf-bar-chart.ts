import { scaleLinear } from "d3-scale";
import { bottomAxis, plotArea, type Box } from "./pdf-axes.js";
import { INK, LINE, MUTED, TEXT } from "./report-style.js";

/** Signed horizontal bars from zero (the sensitivity budget's rank correlations), value printed at the end. */
export function drawBarChart(
  doc: PDFKit.PDFDocument,
  box: Pick<Box, "x" | "y" | "width">,
  options: { bars: Array<{ label: string; value: number; note?: string }>; axisLabel: string; domain: [number, number]; color: string; format: (v: number) => string },
): number {
  const rowHeight = 15;
  const height = options.bars.length * rowHeight + 40;
  const area = plotArea({ ...box, height }, { top: 6, right: 80, bottom: 30, left: 150 });
  const x = scaleLinear().domain(options.domain).range([0, area.width]);
  for (const t of x.ticks(8)) doc.moveTo(area.x + x(t), area.y).lineTo(area.x + x(t), area.y + area.height).lineWidth(0.4).strokeColor(LINE).stroke();
  doc.moveTo(area.x + x(0), area.y).lineTo(area.x + x(0), area.y + area.height).lineWidth(0.9).strokeColor(INK).stroke();
  options.bars.forEach((b, i) => {
    const cy = area.y + i * rowHeight + rowHeight / 2;
    doc.font("sans").fontSize(8).fillColor(TEXT).text(b.label, box.x, cy - 4.5, { width: 142, align: "right", lineBreak: false, ellipsis: true });
    const a = area.x + x(Math.min(0, b.value));
    doc.rect(a, cy - 4.5, Math.max(0.8, Math.abs(x(b.value) - x(0))), 9).fillColor(options.color).fill();
    doc.font("sans").fontSize(7.5).fillColor(MUTED).text(b.note ?? options.format(b.value), area.x + area.width + 6, cy - 4, { width: 76, lineBreak: false });
  });
  bottomAxis(doc, area, x, options.axisLabel, options.format, 8);
  return height;
}
