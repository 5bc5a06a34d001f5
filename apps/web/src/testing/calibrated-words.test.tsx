import { render } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { FanChart } from "@/components/charts/fan-chart";
import { PercentileNote } from "@/components/ui/percentile-note";
import { ResultView } from "@/features/runs/components/result-view";
import { PRESETS } from "@/features/model-versions/lib/presets";
import { uncitedLikelihoodTerms } from "./calibrated-words";
import { fanFixture } from "./fixtures";
import { runFixture, runResultFixture } from "./result-fixture";

/** Every text a user can meet in a rendered tree: visible text plus labels, titles and descriptions. */
function everyText(container: HTMLElement): string {
  const attributes = [...container.querySelectorAll("[aria-label], [title], [aria-description]")].flatMap((el) =>
    ["aria-label", "title", "aria-description"].map((a) => el.getAttribute(a) ?? ""),
  );
  return [container.textContent ?? "", ...attributes].join("\n");
}

// The product's own sources, tests left out (they may quote what must not appear).
const SOURCES = import.meta.glob<string>(["/src/**/*.{ts,tsx}", "!/src/**/*.test.{ts,tsx}", "!/src/testing/**"], {
  query: "?raw",
  import: "default",
  eager: true,
});

describe("calibrated likelihood words (IPCC AR6 WG1 uncertainty language)", () => {
  it("the check itself: flags a band called likely, passes a cited quotation", () => {
    expect(uncitedLikelihoodTerms("Median line, 17–83 % (likely) and 5–95 % (very likely) bands.").map((t) => t.term)).toEqual(["likely", "very likely"]);
    expect(uncitedLikelihoodTerms("Unlikely above 4 K")).toHaveLength(1);
    // Quoted but not cited, and cited but not quoted, both fail.
    expect(uncitedLikelihoodTerms("ECS “very likely” 2–5 K")).toHaveLength(1);
    expect(uncitedLikelihoodTerms("ECS very likely 2–5 K (IPCC 2021)")).toHaveLength(1);
    expect(uncitedLikelihoodTerms("IPCC AR6 WG1 SPM A.4.4 (IPCC 2021): “very likely range” 2–5 K")).toEqual([]);
    // "likelihood" (the constraint's) is not a calibrated term.
    expect(uncitedLikelihoodTerms("the constraint's likelihood")).toEqual([]);
  });

  it("no source file of the web app names a band with them outside a cited quotation", () => {
    expect(Object.keys(SOURCES).length).toBeGreaterThan(100);
    const findings = Object.entries(SOURCES).flatMap(([file, text]) => uncitedLikelihoodTerms(text).map((t) => `${file}: ${t.line}`));
    expect(findings).toEqual([]);
  });

  it("the result page, fan chart and percentile note label bands by their percentiles only", () => {
    const page = render(<ResultView run={runFixture()} result={runResultFixture()} />);
    const pageText = everyText(page.container);
    expect(pageText).toContain("17th–83rd and 5th–95th percentile bands");
    // The sensitivity panel shows the variance budget with its interactions remainder.
    expect(pageText).toContain("What drives the spread in 2100 — Middle road");
    expect(pageText).toContain("Interactions (remainder)");
    expect(uncitedLikelihoodTerms(pageText)).toEqual([]);
    page.unmount();

    const chart = render(<FanChart title="Warming" series={[fanFixture()]} yLabel="Warming (K)" unit="K" />);
    const chartText = everyText(chart.container);
    for (const band of ["5th–95th percentile", "17th–83rd percentile", "median (50th percentile)"]) expect(chartText).toContain(band);
    expect(uncitedLikelihoodTerms(chartText)).toEqual([]);
    chart.unmount();

    const note = render(<PercentileNote />);
    expect(uncitedLikelihoodTerms(everyText(note.container))).toEqual([]);
  });

  it("presets quote the assessment's terms only with the citation beside them", () => {
    const texts = Object.values(PRESETS).flatMap((list) => list.flatMap((p) => [p.label, p.source]));
    expect(texts.some((t) => t.includes("“very likely range”"))).toBe(true);
    expect(texts.flatMap(uncitedLikelihoodTerms)).toEqual([]);
  });
});
