import { render } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { pathPoints, tickMap } from "@/testing/svg-geometry";
import { PerilCurveChart } from "./peril-curve-chart";

// Closed form: multiplier = (1 + r)^(ΔT − ΔT0) with r = 5 / 7 / 9 %/K and ΔT0 = 1 (hand-made, not API output).
const warming = [0, 1, 2, 3];
const at = (r: number) => warming.map((w) => (1 + r) ** (w - 1));
const curve = {
  warming,
  baselineWarming: 1,
  bands: { p5: at(0.05).map((v, i) => (i === 0 ? at(0.09)[0]! : v)), p17: at(0.06), p50: at(0.07), p83: at(0.08), p95: at(0.09).map((v, i) => (i === 0 ? at(0.05)[0]! : v)) },
};

describe("PerilCurveChart", () => {
  it("draws the median through the multipliers and the baseline marker at the risk view's warming", () => {
    const { container } = render(<PerilCurveChart curve={curve} />);
    const x = tickMap(container, "x");
    const y = tickMap(container, "y");
    const median = pathPoints(container.querySelector('[data-band="p50"]')!.getAttribute("d")!);
    expect(median.map((p) => p[0])).toEqual(warming.map((w) => expect.closeTo(x(w), 2)));
    expect(median.map((p) => p[1])).toEqual(curve.bands.p50.map((v) => expect.closeTo(y(v), 2)));
    expect(Number(container.querySelector('[data-testid="baseline-marker"] line')!.getAttribute("x1"))).toBeCloseTo(x(1), 6);
    expect(Number(container.querySelector('[data-testid="unit-line"]')!.getAttribute("y1"))).toBeCloseTo(y(1), 6);
    expect(container.textContent).toContain("Warming above 1850–1900 (K)");
  });

  it("spans the 5–95 % band from p95 on top to p5 below", () => {
    const { container } = render(<PerilCurveChart curve={curve} />);
    const y = tickMap(container, "y");
    const pts = pathPoints(container.querySelector('[data-band="p5-p95"]')!.getAttribute("d")!);
    // d3.area writes the top line left to right, then the bottom line right to left.
    expect(pts[3]![1]).toBeCloseTo(y(curve.bands.p95[3]!), 2);
    expect(pts[4]![1]).toBeCloseTo(y(curve.bands.p5[3]!), 2);
  });

  it("draws one line per table, at the SPM.6 figures, labelled by return period", () => {
    // IPCC AR6 WGI SPM Figure SPM.6: hot extremes at 0 / 1 / 2 / 4 °C, 10-year events 1 / 2.8 / 5.6 / 9.4 times per 10 years, 50-year events 1 / 4.8 / 13.9 / 39.2 times per 50 years.
    const levels = [0, 1, 2, 4];
    const tables = [
      { returnPeriod: 10, multiplier: [1, 2.8, 5.6, 9.4] },
      { returnPeriod: 50, multiplier: [1, 4.8, 13.9, 39.2] },
    ];
    const byTable = { warming: levels, baselineWarming: 0, bands: { p50: tables[0]!.multiplier }, tables };
    const { container } = render(<PerilCurveChart curve={byTable} />);
    const y = tickMap(container, "y");
    for (const t of tables) {
      const pts = pathPoints(container.querySelector(`[data-return-period="${t.returnPeriod}"] path`)!.getAttribute("d")!);
      expect(pts.map((p) => p[1])).toEqual(t.multiplier.map((v) => expect.closeTo(y(v), 2)));
      expect(container.querySelector(`[data-return-period="${t.returnPeriod}"] text`)!.textContent).toBe(`1-in-${t.returnPeriod}`);
    }
    expect(container.querySelector('[data-band="p50"]')).toBeNull();
  });
});
