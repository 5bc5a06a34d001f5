import { scaleLinear } from "d3-scale";
import { bottomAxis, plotArea, type Box } from "./pdf-axes.js";
import { INK, LINE, MUTED, TEXT } from "./report-style.js";

export interface RangeRow {
  label: string;
  color: string;
  p5: number | null;
  p17?: number | null;
  p50: number | null;
  p83?: number | null;
  p95: number | null;
  /** Text after the row (e.g. "never 12 %"). */
  note?: string;
}

/**
 * Horizontal ranges, one row per item: 5–95 % whisker with caps, 17–83 % box when given, a
 * median tick — used for first-crossing years (axis from where the data starts) and for
 * forcing by agent (with a zero line). Returns the height used.
 */
export function drawRangeChart(
  doc: PDFKit.PDFDocument,
  box: Pick<Box, "x" | "y" | "width">,
  options: { rows: RangeRow[]; axisLabel: string; format: (v: number) => string; zeroLine?: boolean; labelWidth?: number; domain?: [number, number] },
): number {
  const rowHeight = 16;
  const labelWidth = options.labelWidth ?? 120;
  const height = options.rows.length * rowHeight + 40;
  const area = plotArea({ ...box, height }, { top: 6, right: 60, bottom: 30, left: labelWidth });
  const values = options.rows.flatMap((r) => [r.p5, r.p95, r.p50]).filter((v): v is number => v !== null && Number.isFinite(v));
  const lo = Math.min(...values, options.zeroLine ? 0 : Infinity);
  const hi = Math.max(...values, options.zeroLine ? 0 : -Infinity);
  const pad = (hi - lo) * 0.05 || 1;
  const x = scaleLinear().domain(options.domain ?? [lo - pad, hi + pad]).range([0, area.width]).nice();
  for (const t of x.ticks(8)) doc.moveTo(area.x + x(t), area.y).lineTo(area.x + x(t), area.y + area.height).lineWidth(0.4).strokeColor(LINE).stroke();
  if (options.zeroLine) doc.moveTo(area.x + x(0), area.y).lineTo(area.x + x(0), area.y + area.height).lineWidth(0.9).strokeColor(INK).stroke();
  options.rows.forEach((r, i) => {
    const cy = area.y + i * rowHeight + rowHeight / 2;
    doc.font("sans").fontSize(8).fillColor(TEXT).text(r.label, box.x, cy - 4.5, { width: labelWidth - 8, align: "right", lineBreak: false, ellipsis: true });
    if (r.p5 !== null && r.p95 !== null) {
      const a = area.x + x(r.p5);
      const b = area.x + x(r.p95);
      doc.moveTo(a, cy).lineTo(b, cy).lineWidth(1).strokeColor(r.color).stroke();
      doc.moveTo(a, cy - 3).lineTo(a, cy + 3).moveTo(b, cy - 3).lineTo(b, cy + 3).stroke();
    }
    if (r.p17 !== undefined && r.p83 !== undefined && r.p17 !== null && r.p83 !== null)
      doc.rect(area.x + x(r.p17), cy - 4, Math.max(1, x(r.p83) - x(r.p17)), 8).fillColor(r.color).fillOpacity(0.35).fill().fillOpacity(1);
    if (r.p50 !== null) doc.rect(area.x + x(r.p50) - 1.2, cy - 5.5, 2.4, 11).fillColor(r.color).fill();
    if (r.note) doc.font("sans").fontSize(7.5).fillColor(MUTED).text(r.note, area.x + area.width + 6, cy - 4, { width: 56, lineBreak: false });
  });
  bottomAxis(doc, area, x, options.axisLabel, options.format, 8);
  return height;
}
