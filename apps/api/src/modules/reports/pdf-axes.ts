import type { ScaleLinear } from "d3-scale";
import { INK, LINE, MUTED } from "./report-style.js";

export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** The plot area inside a chart box, leaving room for the axis labels. */
export function plotArea(box: Box, margins = { top: 8, right: 10, bottom: 30, left: 46 }): Box {
  return { x: box.x + margins.left, y: box.y + margins.top, width: box.width - margins.left - margins.right, height: box.height - margins.top - margins.bottom };
}

/** Left axis: gridlines across the plot at each tick, tick labels, the axis title turned upright. */
export function leftAxis(doc: PDFKit.PDFDocument, area: Box, y: ScaleLinear<number, number>, label: string, format: (v: number) => string, ticks = 5): void {
  doc.font("sans").fontSize(7.5);
  for (const t of y.ticks(ticks)) {
    const py = area.y + y(t);
    doc.moveTo(area.x, py).lineTo(area.x + area.width, py).lineWidth(0.4).strokeColor(LINE).undash().stroke();
    doc.fillColor(MUTED).text(format(t), area.x - 40, py - 3.5, { width: 36, align: "right", lineBreak: false });
  }
  doc.save();
  doc.rotate(-90, { origin: [area.x - 38, area.y + area.height / 2] });
  doc.font("sans").fontSize(7.5).fillColor(MUTED).text(label, area.x - 38 - area.height / 2, area.y + area.height / 2 - 8, { width: area.height, align: "center", lineBreak: false });
  doc.restore();
}

/** Bottom axis: the base line, ticks with labels and the axis title. */
export function bottomAxis(doc: PDFKit.PDFDocument, area: Box, x: ScaleLinear<number, number>, label: string, format: (v: number) => string, ticks = 8): void {
  const base = area.y + area.height;
  doc.moveTo(area.x, base).lineTo(area.x + area.width, base).lineWidth(0.8).strokeColor(INK).undash().stroke();
  doc.font("sans").fontSize(7.5).fillColor(MUTED);
  for (const t of x.ticks(ticks)) {
    const px = area.x + x(t);
    doc.moveTo(px, base).lineTo(px, base + 3).lineWidth(0.6).strokeColor(INK).stroke();
    doc.text(format(t), px - 20, base + 5, { width: 40, align: "center", lineBreak: false });
  }
  doc.text(label, area.x, base + 16, { width: area.width, align: "center", lineBreak: false });
}

/** A legend row: swatches and names, wrapping across the width. Returns the height used. */
export function legend(
  doc: PDFKit.PDFDocument,
  x: number,
  y: number,
  width: number,
  items: Array<{ label: string; color: string; kind: "band" | "line"; dash?: number[] }>,
): number {
  doc.font("sans").fontSize(7.5);
  let cx = x;
  let cy = y;
  for (const item of items) {
    const w = 22 + doc.widthOfString(item.label) + 12;
    if (cx + w > x + width) {
      cx = x;
      cy += 12;
    }
    if (item.kind === "band") doc.rect(cx, cy + 1, 16, 7).fillColor(item.color).fillOpacity(0.3).fill().fillOpacity(1);
    doc.moveTo(cx, cy + 4.5).lineTo(cx + 16, cy + 4.5).lineWidth(1.6).strokeColor(item.color);
    if (item.dash) doc.dash(item.dash[0]!, { space: item.dash[1]! });
    doc.stroke().undash();
    doc.fillColor(MUTED).text(item.label, cx + 20, cy + 0.5, { lineBreak: false });
    cx += w;
  }
  return cy - y + 12;
}
