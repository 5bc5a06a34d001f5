import { loadPdfKit } from "../../lazy-modules.js";
import { DANGER, FAINT, INK, LINE, LINE_STRONG, MUTED, OK, REPORT_FONTS, SURFACE_2, TEXT } from "./report-style.js";

export interface Column {
  label: string;
  width: number;
  align?: "left" | "right";
  mono?: boolean;
}

/**
 * A4 pages with Plumeline's fonts and a running head and foot, and the few blocks a report
 * needs — headings, paragraphs, key/value lists, tables that repeat their header over a page
 * break, and room for a chart. Every page states the run and whether it is exploratory; the
 * foot names the result hash and the page number (written once all pages exist).
 */
export class ReportWriter {
  readonly doc: PDFKit.PDFDocument;
  readonly left = 48;
  readonly width = 595.28 - 96;
  private readonly bottom = 841.89 - 56;

  /** A writer with its first page open (PDFKit is loaded on first use: lazy-modules.ts). */
  static async open(head: { title: string; exploratory: boolean; foot: string }, createdAt: Date): Promise<ReportWriter> {
    return new ReportWriter(await loadPdfKit(), head, createdAt);
  }

  private constructor(
    PDFDocument: Awaited<ReturnType<typeof loadPdfKit>>,
    private readonly head: { title: string; exploratory: boolean; foot: string },
    createdAt: Date,
  ) {
    this.doc = new PDFDocument({
      size: "A4",
      margins: { top: 64, bottom: 56, left: 48, right: 48 },
      bufferPages: true,
      // Fixed metadata: the same export rebuilds to the same bytes (the file id derives from it).
      info: { Title: head.title, Author: "Plumeline", Creator: "Plumeline", Producer: "Plumeline (PDFKit)", CreationDate: createdAt, ModDate: createdAt },
      displayTitle: true,
      lang: "en-GB",
    });
    this.doc.registerFont("sans", REPORT_FONTS.sans);
    this.doc.registerFont("sans-italic", REPORT_FONTS.sansItalic);
    this.doc.registerFont("sans-bold", REPORT_FONTS.sansBold);
    this.doc.registerFont("mono", REPORT_FONTS.mono);
    this.doc.font("sans").fontSize(9.5).fillColor(TEXT);
  }

  get y(): number {
    return this.doc.y;
  }

  /** Starts a new page unless `height` points still fit on this one. */
  ensure(height: number): void {
    if (this.doc.y + height > this.bottom) this.doc.addPage();
  }

  newPage(): void {
    this.doc.addPage();
  }

  h1(text: string): void {
    this.doc.font("sans-bold").fontSize(20).fillColor(INK).text(text, this.left, this.doc.y, { width: this.width });
    this.doc.moveDown(0.3);
  }

  h2(text: string): void {
    this.ensure(60);
    this.doc.moveDown(0.6);
    this.doc.font("sans-bold").fontSize(13).fillColor(INK).text(text, this.left, this.doc.y, { width: this.width });
    const y = this.doc.y + 2;
    this.doc.moveTo(this.left, y).lineTo(this.left + this.width, y).lineWidth(0.6).strokeColor(LINE_STRONG).stroke();
    this.doc.y = y + 6;
  }

  /** A small heading kept on one page with the first `keepWith` points of what follows it. */
  h3(text: string, keepWith = 40): void {
    this.ensure(keepWith + 20);
    this.doc.moveDown(0.4);
    this.doc.font("sans-bold").fontSize(10.5).fillColor(INK).text(text, this.left, this.doc.y, { width: this.width });
    this.doc.moveDown(0.2);
  }

  paragraph(text: string, options: { muted?: boolean; italic?: boolean; size?: number } = {}): void {
    this.doc
      .font(options.italic ? "sans-italic" : "sans")
      .fontSize(options.size ?? 9.5)
      .fillColor(options.muted ? MUTED : TEXT)
      .text(text, this.left, this.doc.y, { width: this.width, lineGap: 1.5 });
    this.doc.moveDown(0.35);
  }

  bullets(lines: readonly string[], options: { size?: number } = {}): void {
    for (const line of lines) {
      this.ensure(24);
      const y = this.doc.y;
      this.doc.font("sans").fontSize(options.size ?? 9).fillColor(TEXT);
      this.doc.text("•", this.left + 2, y, { width: 10, lineBreak: false });
      this.doc.text(line, this.left + 14, y, { width: this.width - 14, lineGap: 1.2 });
      this.doc.moveDown(0.2);
    }
  }

  /** A banner across the text column: red for exploratory, green for approved. */
  banner(text: string, tone: "danger" | "ok"): void {
    const color = tone === "danger" ? DANGER : OK;
    this.doc.font("sans-bold").fontSize(10);
    const height = this.doc.heightOfString(text, { width: this.width - 20 }) + 12;
    this.ensure(height + 6);
    const y = this.doc.y;
    this.doc.rect(this.left, y, this.width, height).lineWidth(1.2).strokeColor(color).stroke();
    this.doc.rect(this.left, y, 4, height).fillColor(color).fill();
    this.doc.fillColor(color).text(text, this.left + 12, y + 6, { width: this.width - 20 });
    this.doc.y = y + height + 8;
  }

  /** Label/value pairs in two columns; `mono` values (hashes) in the monospace face. */
  keyValues(pairs: ReadonlyArray<readonly [string, string, { mono?: boolean }?]>, labelWidth = 130): void {
    for (const [label, value, options] of pairs) {
      const valueFont = options?.mono ? "mono" : "sans";
      this.doc.font(valueFont).fontSize(options?.mono ? 8.2 : 9.5);
      const height = Math.max(12, this.doc.heightOfString(value || "–", { width: this.width - labelWidth }));
      this.ensure(height + 3);
      const y = this.doc.y;
      this.doc.font("sans-bold").fontSize(9).fillColor(MUTED).text(label, this.left, y, { width: labelWidth - 8 });
      this.doc.font(valueFont).fontSize(options?.mono ? 8.2 : 9.5).fillColor(TEXT).text(value || "–", this.left + labelWidth, y + (options?.mono ? 1 : 0), {
        width: this.width - labelWidth,
      });
      this.doc.y = Math.max(this.doc.y, y + 12) + 3;
    }
  }

  /**
   * A table with a header row (repeated after a page break), hairline rules and numbers
   * right-aligned in tabular figures; `bold` marks a column (the median) as the one to read.
   */
  table(columns: Column[], rows: string[][], options: { caption?: string; boldColumn?: number; size?: number } = {}): void {
    const size = options.size ?? 8.5;
    const rowHeight = size + 6.5;
    const scale = this.width / columns.reduce((s, c) => s + c.width, 0);
    const widths = columns.map((c) => c.width * scale);
    const header = () => {
      const y = this.doc.y;
      this.doc.font("sans-bold").fontSize(size - 0.5).fillColor(MUTED);
      let height = 0;
      for (const [i, c] of columns.entries()) height = Math.max(height, this.doc.heightOfString(c.label, { width: widths[i]! - 6 }));
      let x = this.left;
      columns.forEach((c, i) => {
        this.doc.text(c.label, x + 3, y + 2, { width: widths[i]! - 6, align: c.align ?? "left" });
        x += widths[i]!;
      });
      const bottom = y + height + 5;
      this.doc.moveTo(this.left, bottom).lineTo(this.left + this.width, bottom).lineWidth(0.8).strokeColor(LINE_STRONG).stroke();
      this.doc.y = bottom + 1;
    };
    if (options.caption) {
      this.ensure(rowHeight * 3 + 16);
      this.doc.font("sans-bold").fontSize(9).fillColor(INK).text(options.caption, this.left, this.doc.y, { width: this.width });
      this.doc.moveDown(0.15);
    }
    this.ensure(rowHeight * 3);
    header();
    const cellFont = (c: Column, i: number) => {
      const font = c.mono ? "mono" : i === options.boldColumn ? "sans-bold" : "sans";
      return this.doc.font(font).fontSize(c.mono ? size - 1 : size);
    };
    rows.forEach((row, r) => {
      // A long cell (a pathway's source) wraps inside its column and the row grows to hold it;
      // a fixed row height let wrapped text run over the rows below.
      let height = rowHeight;
      columns.forEach((c, i) => {
        height = Math.max(height, cellFont(c, i).heightOfString(row[i] ?? "", { width: widths[i]! - 6 }) + 6.5);
      });
      if (this.doc.y + height > this.bottom) {
        this.doc.addPage();
        header();
      }
      const y = this.doc.y;
      if (r % 2 === 1) this.doc.rect(this.left, y, this.width, height).fillColor(SURFACE_2).fillOpacity(0.55).fill().fillOpacity(1);
      let x = this.left;
      columns.forEach((c, i) => {
        cellFont(c, i).fillColor(TEXT);
        this.doc.text(row[i] ?? "", x + 3, y + 3.5, { width: widths[i]! - 6, align: c.align ?? "left" });
        x += widths[i]!;
      });
      this.doc.moveTo(this.left, y + height).lineTo(this.left + this.width, y + height).lineWidth(0.4).strokeColor(LINE).stroke();
      this.doc.y = y + height;
    });
    this.doc.x = this.left;
    this.doc.moveDown(0.5);
  }

  /** Reserves `height` points for a chart (on a new page if need be) and returns its top. */
  reserve(height: number): number {
    this.ensure(height);
    const top = this.doc.y;
    this.doc.y = top + height;
    return top;
  }

  /** Writes the running head and foot on every page, then ends the document. */
  async finish(): Promise<Buffer> {
    const range = this.doc.bufferedPageRange();
    for (let i = range.start; i < range.start + range.count; i++) {
      this.doc.switchToPage(i);
      const margins = this.doc.page.margins;
      this.doc.page.margins = { top: 0, bottom: 0, left: 0, right: 0 };
      this.doc.font("sans-bold").fontSize(8).fillColor(INK).text("Plumeline · run report", this.left, 28, { width: 200, lineBreak: false });
      this.doc.font("sans").fontSize(8).fillColor(MUTED).text(this.head.title, this.left + 110, 28, { width: 230, lineBreak: false, ellipsis: true });
      const stamp = this.head.exploratory ? "EXPLORATORY — not for filings" : "APPROVED model version";
      this.doc.font("sans-bold").fontSize(8.5).fillColor(this.head.exploratory ? DANGER : OK);
      const stampWidth = this.doc.widthOfString(stamp) + 12;
      const x = this.left + this.width - stampWidth;
      this.doc.rect(x, 24, stampWidth, 15).lineWidth(0.9).strokeColor(this.head.exploratory ? DANGER : OK).stroke();
      this.doc.text(stamp, x + 6, 28, { width: stampWidth - 8, lineBreak: false });
      this.doc.moveTo(this.left, 44).lineTo(this.left + this.width, 44).lineWidth(0.5).strokeColor(LINE).stroke();
      this.doc.font("sans").fontSize(7.5).fillColor(FAINT);
      this.doc.text(this.head.foot, this.left, 841.89 - 36, { width: this.width - 70, lineBreak: false, ellipsis: true });
      this.doc.text(`page ${i - range.start + 1} of ${range.count}`, this.left + this.width - 70, 841.89 - 36, { width: 70, align: "right", lineBreak: false });
      this.doc.page.margins = margins;
    }
    const chunks: Buffer[] = [];
    this.doc.on("data", (c: Buffer) => chunks.push(c));
    const ended = new Promise<void>((resolve) => this.doc.on("end", () => resolve()));
    this.doc.end();
    await ended;
    return Buffer.concat(chunks);
  }
}
