import { fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { fanFixture } from "@/testing/fixtures";
import { chartFileName, wrapText } from "./chart-export";
import { ChartSourceProvider, runSourceLine } from "./chart-source";
import { ExceedanceChart } from "./exceedance-chart";
import { FanChart } from "./fan-chart";

/**
 * jsdom has no URL.createObjectURL (a browser hands the blob to its download manager); the
 * test installs one that keeps the blob, so the file the button would save can be read back.
 */
let saved: Array<{ blob: Blob; name: string }> = [];
const realCreate = URL.createObjectURL.bind(URL) as typeof URL.createObjectURL | undefined;
beforeEach(() => {
  saved = [];
  URL.createObjectURL = (blob: Blob | MediaSource) => {
    saved.push({ blob: blob as Blob, name: "" });
    return `blob:chart-${saved.length}`;
  };
  URL.revokeObjectURL = () => undefined;
  // The anchor's download name is read when it is clicked.
  HTMLAnchorElement.prototype.click = function (this: HTMLAnchorElement) {
    saved.at(-1)!.name = this.download;
  };
});
afterEach(() => {
  if (realCreate) URL.createObjectURL = realCreate;
});

const run = { name: "Board pack 2026", modelVersion: { name: "Harbourline central", versionNumber: 3 } };
const hash = "sha256:4f2a9c0d1e7b6a5f4e3d2c1b0a9f8e7d6c5b4a3f2e1d0c9b8a7f6e5d4c3b2a19";

async function downloadedSvg(): Promise<{ text: string; doc: Document; name: string }> {
  fireEvent.click(screen.getAllByRole("button", { name: "Download chart as SVG" })[0]!);
  await waitFor(() => expect(saved).toHaveLength(1));
  // jsdom's Blob has no text(); FileReader reads it the older way.
  const text = await new Promise<string>((resolve) => {
    const reader = new FileReader();
    reader.onload = () => resolve(reader.result as string);
    reader.readAsText(saved[0]!.blob);
  });
  return { text, doc: new DOMParser().parseFromString(text, "image/svg+xml"), name: saved[0]!.name };
}

const texts = (doc: Document) => Array.from(doc.querySelectorAll("text")).map((t) => t.textContent ?? "");

describe("chart downloads", () => {
  it("a fan chart's SVG carries its title, units, every legend label and the run footnote", async () => {
    render(
      <ChartSourceProvider source={{ lines: [runSourceLine(run, hash)], fileLabel: run.name }}>
        <FanChart
          title="Warming above 1850–1900 (K)"
          series={[fanFixture("a", "Middle road"), { ...fanFixture("b", "Fast exit", -0.4), treatment: "median" }]}
          yLabel="Warming above 1850–1900 (K)"
          unit="K"
          thresholds={[1.5, 2]}
        />
      </ChartSourceProvider>,
    );
    const { text, doc, name } = await downloadedSvg();
    // Well-formed XML: a parser error would come back as a <parsererror> document.
    expect(doc.querySelector("parsererror")).toBeNull();
    expect(doc.documentElement.getAttribute("font-family")).toContain("IBM Plex Sans");
    const all = texts(doc);
    expect(all[0]).toBe("Warming above 1850–1900 (K)");
    expect(all).toContain("Units: K");
    expect(all).toContain("Middle road (filled bands)");
    expect(all).toContain("Fast exit (median only)");
    expect(all).toContain("1.5 K threshold");
    expect(all).toContain("2 K threshold");
    expect(all.some((t) => t.includes("5th–95th percentile (light)"))).toBe(true);
    // The footnote names the run, the model version with its number, and the full result hash.
    const footnote = all.join(" ");
    expect(footnote).toContain("Run “Board pack 2026”");
    expect(footnote).toContain("model version Harbourline central v3");
    expect(footnote).toContain(hash);
    // The chart itself is inside, with its axis label and no page-only attributes.
    expect(all).toContain("Year");
    expect(text).not.toContain("tabindex");
    expect(text).not.toContain("class=");
    expect(name).toBe("plumeline-board-pack-2026-warming-above-1850-1900-k.svg");
  });

  it("an exceedance chart's SVG names its unit and one legend entry per threshold", async () => {
    const years = [2000, 2010, 2020, 2030];
    render(
      <ChartSourceProvider source={{ lines: [runSourceLine(run, hash, true)] }}>
        <ExceedanceChart
          title="Chance of exceeding"
          years={years}
          curves={[
            { threshold: 1.5, probability: [0, 0.1, 0.4, 0.8] },
            { threshold: 2, probability: [0, 0, 0.1, 0.3] },
          ]}
        />
      </ChartSourceProvider>,
    );
    const { doc, name } = await downloadedSvg();
    const all = texts(doc);
    expect(all.some((t) => t.startsWith("Units: % of members"))).toBe(true);
    expect(all).toContain("above 1.5 K");
    expect(all).toContain("above 2 K");
    expect(all.join(" ")).toContain("v3 (exploratory)");
    expect(name).toBe("plumeline-chance-of-exceeding.svg");
  });

  it("without a source on the page the footnote says so rather than naming nothing", async () => {
    render(<FanChart title="Warming" series={[fanFixture()]} yLabel="Warming (K)" unit="K" />);
    const { doc } = await downloadedSvg();
    expect(texts(doc).join(" ")).toContain("Source not stated on this page.");
  });
});

describe("wrapText", () => {
  it("breaks at spaces to fit the width and keeps a long hash whole", () => {
    expect(wrapText("aaa bbb ccc", 70, 10)).toEqual(["aaa bbb", "ccc"]);
    expect(wrapText(`hash ${hash}`, 100, 10)).toEqual(["hash", hash]);
  });
});

describe("chartFileName", () => {
  it("keeps letters and digits, folds accents, joins with dashes", () => {
    expect(chartFileName("Première vue — 2 °C", "Run A/B", "png")).toBe("plumeline-run-a-b-premiere-vue-2-c.png");
  });
});
