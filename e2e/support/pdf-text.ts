import { execFileSync } from "node:child_process";

/**
 * The text of a downloaded PDF as poppler's pdftotext extracts it (Debian's poppler-utils),
 * page by page, with the layout kept so a table row stays on one line.
 */
export function pdfPages(file: string): string[] {
  const text = execFileSync("pdftotext", ["-layout", "-enc", "UTF-8", file, "-"], { encoding: "utf8" });
  // pdftotext ends every page with a form feed.
  return text.split("\f").filter((page) => page.trim() !== "");
}

/** The cells of a table row as written on one line: split where two or more spaces separate them. */
export function lineCells(line: string): string[] {
  return line.trim().split(/\s{2,}/);
}
