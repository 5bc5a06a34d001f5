import { readFileSync } from "node:fs";
import { expect, type Locator, type Page, type TestInfo } from "@playwright/test";

/**
 * Downloads one chart (the figure named `title`) as SVG and as PNG through its own buttons,
 * and returns the SVG's text and both files' names. The PNG is drawn at twice the chart's size.
 */
export async function downloadChart(page: Page, figure: Locator, testInfo: TestInfo) {
  const files: Record<"svg" | "png", { name: string; path: string }> = { svg: { name: "", path: "" }, png: { name: "", path: "" } };
  for (const kind of ["svg", "png"] as const) {
    const started = page.waitForEvent("download");
    await figure.getByRole("button", { name: `Download chart as ${kind.toUpperCase()}` }).click();
    const download = await started;
    const path = testInfo.outputPath(download.suggestedFilename());
    await download.saveAs(path);
    files[kind] = { name: download.suggestedFilename(), path };
  }
  const png = readFileSync(files.png.path);
  // PNG signature, then the IHDR chunk's width and height (big-endian, bytes 16–23).
  expect(png.subarray(0, 8).toString("hex")).toBe("89504e470d0a1a0a");
  const svg = readFileSync(files.svg.path, "utf8");
  const svgWidth = Number(/<svg[^>]*\swidth="(\d+)"/.exec(svg)?.[1]);
  expect(png.readUInt32BE(16)).toBe(2 * svgWidth);
  return { svg, svgName: files.svg.name, pngName: files.png.name, pngPath: files.png.path };
}
