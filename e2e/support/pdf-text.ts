import { execFileSync } from "node:child_process";

/**
 * The text of a downloaded PDF as poppler's pdftotext extracts it (Debian's poppler-utils),
 * page by page, in the order it was written (-raw): a table row comes out as one line with
 * its cells separated by single spaces. (-layout keeps columns, but drops the spaces inside
 * a right-aligned cell such as "< 1 %".)
 */
export function pdfPages(file: string): string[] {
  const text = execFileSync("pdftotext", ["-raw", "-enc", "UTF-8", file, "-"], { encoding: "utf8" });
  // pdftotext ends every page with a form feed.
  return text.split("\f").filter((page) => page.trim() !== "");
}
