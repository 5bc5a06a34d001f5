/**
 * A chart leaves the product as a self-contained SVG (or a PNG drawn from it): the chart's own
 * <svg> with its colours and fonts written inline (a file has no stylesheet and no CSS
 * variables), a title and units line above it, the legend below it and a footnote naming
 * where the numbers come from. Built with DOM calls and XMLSerializer so every text is
 * escaped as XML.
 */

export interface LegendEntry {
  label: string;
  color: string;
  /** "line" draws a short stroke (medians, curves), "swatch" a filled square (bands, bars). */
  kind?: "line" | "swatch";
  dash?: string;
}

export interface ChartExportMeta {
  title: string;
  /** e.g. "K", "W m⁻²", "% of members"; written as "Units: …" under the title. */
  units: string;
  legend: LegendEntry[];
  footnote: string[];
}

const SVG_NS = "http://www.w3.org/2000/svg";
export const EXPORT_FONT_FAMILY = "'IBM Plex Sans', 'Helvetica Neue', Arial, sans-serif";

/** Presentation properties copied from the live chart's computed style onto the copy. */
const INLINED_PROPERTIES = [
  "fill",
  "fill-opacity",
  "stroke",
  "stroke-width",
  "stroke-dasharray",
  "stroke-opacity",
  "opacity",
  "font-size",
  "font-weight",
  "text-anchor",
  "dominant-baseline",
] as const;

const PAD = 16;
const TITLE_SIZE = 15;
const TEXT_SIZE = 11;
// Average glyph width of IBM Plex Sans at 11 px: enough to wrap legend rows and footnotes.
const CHAR_WIDTH = 6.1;

function el<K extends keyof SVGElementTagNameMap>(
  doc: Document,
  tag: K,
  attrs: Record<string, string | number>,
  text?: string,
): SVGElementTagNameMap[K] {
  const node = doc.createElementNS(SVG_NS, tag);
  for (const [k, v] of Object.entries(attrs)) node.setAttribute(k, String(v));
  if (text !== undefined) node.textContent = text;
  return node;
}

/** Splits a line at spaces so it fits `width` pixels; a single long word (a hash) stays whole. */
export function wrapText(text: string, width: number, charWidth = CHAR_WIDTH): string[] {
  const max = Math.max(10, Math.floor(width / charWidth));
  const lines: string[] = [];
  let current = "";
  for (const word of text.split(" ")) {
    const next = current ? `${current} ${word}` : word;
    if (next.length > max && current) {
      lines.push(current);
      current = word;
    } else current = next;
  }
  if (current) lines.push(current);
  return lines;
}

/** Replaces the live page's styling with inline styles, and drops what only the page uses. */
function inlineStyles(source: SVGSVGElement, copy: SVGSVGElement) {
  const view = source.ownerDocument.defaultView;
  const from = [source, ...Array.from(source.querySelectorAll("*"))];
  const to = [copy, ...Array.from(copy.querySelectorAll("*"))];
  from.forEach((node, i) => {
    const target = to[i];
    if (!target || !view) return;
    const computed = view.getComputedStyle(node);
    const style: string[] = [];
    for (const p of INLINED_PROPERTIES) {
      const v = computed.getPropertyValue(p);
      // jsdom and detached nodes give empty values; leave the attribute to speak then.
      if (v && !v.includes("var(")) style.push(`${p}:${v}`);
    }
    if (style.length) target.setAttribute("style", style.join(";"));
    target.removeAttribute("class");
    target.removeAttribute("tabindex");
    for (const a of Array.from(target.attributes))
      if (a.name.startsWith("aria-") || a.name.startsWith("data-") || a.name === "role") target.removeAttribute(a.name);
  });
  // Attributes that still name a CSS variable (the page's palette) get its value.
  for (const node of to)
    for (const a of ["fill", "stroke"]) {
      const value = node.getAttribute(a);
      if (value?.startsWith("var(")) node.setAttribute(a, resolveColor(source.ownerDocument, value));
    }
}

/** "var(--pl-series-1)" -> the palette's value on this page; plain colours pass through. */
export function resolveColor(doc: Document, color: string): string {
  const name = /^var\((--[\w-]+)\)$/.exec(color.trim())?.[1];
  if (!name) return color;
  const value = doc.defaultView?.getComputedStyle(doc.documentElement).getPropertyValue(name).trim();
  // A palette variable the page does not define falls back to the ink colour, never to nothing.
  return value || "#14213d";
}

/**
 * The downloadable SVG text: header (title, units), the chart, the legend and the footnote,
 * on a white page as wide as the chart.
 */
export function buildChartSvg(chart: SVGSVGElement, meta: ChartExportMeta): { svg: string; width: number; height: number } {
  const doc = chart.ownerDocument;
  const chartWidth = Number(chart.getAttribute("width")) || chart.getBoundingClientRect().width || 640;
  const chartHeight = Number(chart.getAttribute("height")) || chart.getBoundingClientRect().height || 320;
  const width = Math.max(chartWidth + 2 * PAD, 480);
  const textWidth = width - 2 * PAD;

  // XMLSerializer writes the xmlns itself; setting it as well would duplicate the attribute.
  const out = el(doc, "svg", { "font-family": EXPORT_FONT_FAMILY });
  out.appendChild(el(doc, "title", {}, meta.title));
  const page = el(doc, "rect", { x: 0, y: 0, width, height: 0, fill: "#ffffff" });
  out.appendChild(page);

  let y = PAD;
  const header = el(doc, "g", { id: "chart-header" });
  for (const line of wrapText(meta.title, textWidth, CHAR_WIDTH * 1.35)) {
    y += TITLE_SIZE + 3;
    header.appendChild(el(doc, "text", { x: PAD, y, "font-size": TITLE_SIZE, "font-weight": 600, fill: "#14213d" }, line));
  }
  y += TEXT_SIZE + 6;
  header.appendChild(el(doc, "text", { x: PAD, y, "font-size": TEXT_SIZE, fill: "#4b5563" }, `Units: ${meta.units}`));
  out.appendChild(header);
  y += 10;

  const copy = chart.cloneNode(true) as SVGSVGElement;
  inlineStyles(chart, copy);
  copy.setAttribute("x", String(PAD));
  copy.setAttribute("y", String(y));
  copy.setAttribute("width", String(chartWidth));
  copy.setAttribute("height", String(chartHeight));
  copy.setAttribute("overflow", "visible");
  out.appendChild(copy);
  y += chartHeight + 8;

  if (meta.legend.length) {
    const legend = el(doc, "g", { id: "chart-legend" });
    let x = PAD;
    y += TEXT_SIZE + 4;
    for (const entry of meta.legend) {
      const itemWidth = 26 + entry.label.length * CHAR_WIDTH + 14;
      if (x > PAD && x + itemWidth > width - PAD) {
        x = PAD;
        y += TEXT_SIZE + 8;
      }
      const color = resolveColor(doc, entry.color);
      if (entry.kind === "swatch")
        legend.appendChild(el(doc, "rect", { x, y: y - 9, width: 18, height: 10, rx: 2, fill: color, "fill-opacity": 0.6 }));
      else
        legend.appendChild(
          el(doc, "line", {
            x1: x,
            x2: x + 18,
            y1: y - 4,
            y2: y - 4,
            stroke: color,
            "stroke-width": 2.5,
            ...(entry.dash ? { "stroke-dasharray": entry.dash } : {}),
          }),
        );
      legend.appendChild(el(doc, "text", { x: x + 24, y, "font-size": TEXT_SIZE, fill: "#1f2937" }, entry.label));
      x += itemWidth;
    }
    out.appendChild(legend);
    y += 8;
  }

  const foot = el(doc, "g", { id: "chart-footnote" });
  y += 6;
  foot.appendChild(el(doc, "line", { x1: PAD, x2: width - PAD, y1: y, y2: y, stroke: "#d1d5db" }));
  y += 4;
  for (const line of meta.footnote.flatMap((l) => wrapText(l, textWidth, CHAR_WIDTH * 0.9))) {
    y += TEXT_SIZE - 1 + 4;
    foot.appendChild(el(doc, "text", { x: PAD, y, "font-size": TEXT_SIZE - 1, fill: "#4b5563" }, line));
  }
  out.appendChild(foot);
  const height = Math.ceil(y + PAD);

  page.setAttribute("height", String(height));
  out.setAttribute("width", String(width));
  out.setAttribute("height", String(height));
  out.setAttribute("viewBox", `0 0 ${width} ${height}`);
  const svg = `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(out)}`;
  return { svg, width, height };
}

/** A file name from the chart's title and the run: lower case, dashes, no odd characters. */
export function chartFileName(title: string, runName: string | undefined, ext: "svg" | "png"): string {
  const slug = (s: string) =>
    s
      .normalize("NFKD")
      .replace(/[\u0300-\u036f]/g, "")
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 60);
  return `${["plumeline", runName ? slug(runName) : "", slug(title)].filter(Boolean).join("-")}.${ext}`;
}

function saveBlob(blob: Blob, fileName: string) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  // The click has handed the blob to the download by the next task.
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

export function downloadSvg(svg: string, fileName: string) {
  saveBlob(new Blob([svg], { type: "image/svg+xml;charset=utf-8" }), fileName);
}

/** Draws the SVG into a canvas at `scale`× (2× reads sharply on slides and print) and saves a PNG. */
export async function downloadPng(svg: string, width: number, height: number, fileName: string, scale = 2) {
  // A data: URL, not a blob: one: the app's content security policy lets images load from
  // 'self' and data: only, so a blob: image would fail to load.
  const image = new Image();
  image.width = width;
  image.height = height;
  await new Promise<void>((resolve, reject) => {
    image.onload = () => resolve();
    image.onerror = () => reject(new Error("The chart could not be drawn as an image"));
    image.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
  });
  const canvas = document.createElement("canvas");
  canvas.width = Math.round(width * scale);
  canvas.height = Math.round(height * scale);
  const ctx = canvas.getContext("2d");
  if (!ctx) throw new Error("This browser cannot draw to a canvas, so no PNG can be made; download the SVG instead");
  ctx.scale(scale, scale);
  ctx.drawImage(image, 0, 0, width, height);
  const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/png"));
  if (!blob) throw new Error("The chart could not be encoded as PNG");
  saveBlob(blob, fileName);
}
