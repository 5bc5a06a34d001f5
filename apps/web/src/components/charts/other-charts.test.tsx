import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { pathPoints, tickMap } from "@/testing/svg-geometry";
import { CrossingHistogram, crossingBins, crossingBinsPerYear } from "./crossing-histogram";
import { ExceedanceChart } from "./exceedance-chart";
import { ForcingBreakdownChart } from "./forcing-breakdown-chart";
import { ForcingStackChart } from "./forcing-stack-chart";
import { inputLabel } from "@/lib/input-labels";
import { SensitivityBars } from "./sensitivity-bars";

describe("ExceedanceChart", () => {
  it("plots probabilities as percent on a 0–100 axis", () => {
    const years = [2000, 2010, 2020];
    const { container } = render(
      <ExceedanceChart title="Exceedance" years={years} curves={[{ threshold: 2, probability: [0, 0.25, 0.5] }]} />,
    );
    const y = tickMap(container, "y");
    const pts = pathPoints(container.querySelector('[data-threshold="2"]')!.getAttribute("d")!);
    // d3-path rounds coordinates to 3 decimals
    expect(pts.map((p) => p[1])).toEqual([y(0), y(25), y(50)].map((v) => expect.closeTo(v, 2)));
    expect(container.textContent).toContain("Probability of exceeding (%)");
  });

  it("tables a vanishing weighted chance as < 0.1 %, never in scientific notation", async () => {
    const years = [2000, 2010, 2020];
    render(<ExceedanceChart title="Exceedance" years={years} curves={[{ threshold: 2, probability: [5e-109, 0.123456, 1 - 1e-9] }]} />);
    await userEvent.click(screen.getByRole("button", { name: "Show table" }));
    const table = screen.getByRole("table");
    expect(within(table).getAllByRole("columnheader").map((c) => c.textContent)).toEqual(["Year", "Chance > 2 K"]);
    const cells = within(table).getAllByRole("cell").map((c) => c.textContent);
    expect(cells).toEqual(["2000", "< 0.1 %", "2010", "12.3 %", "2020", "> 99.9 %"]);
    expect(table.textContent).not.toMatch(/\de-\d/i);
  });
});

describe("crossingBins", () => {
  it("gives each interval between consecutive percentiles its share of members", () => {
    // Shares follow from the percentile definitions: 17−5 = 12 %, 50−17 = 33 %, …
    const bins = crossingBins({ p5: 2030, p17: 2035, p50: 2045, p83: 2060, p95: 2080 });
    expect(bins).toEqual([
      { from: 2030, to: 2035, share: expect.closeTo(0.12, 12) },
      { from: 2035, to: 2045, share: expect.closeTo(0.33, 12) },
      { from: 2045, to: 2060, share: expect.closeTo(0.33, 12) },
      { from: 2060, to: 2080, share: expect.closeTo(0.12, 12) },
    ]);
  });

  it("leaves intervals that end in 'never' to the never share", () => {
    const bins = crossingBins({ p5: 2030, p17: 2035, p50: 2045, p83: null, p95: null });
    expect(bins.map((b) => b.to)).toEqual([2035, 2045]);
  });

  it("draws bars whose area is the share, and the never share apart on its own scale", () => {
    const percentiles = { p5: 2030, p17: 2036, p50: 2045, p83: 2060, p95: null };
    const { container } = render(
      <CrossingHistogram
        title="Crossing 2 K"
        crossing={{ threshold: 2, percentiles, never: 0.79, lastYear: 2100, bins: crossingBins(percentiles), binSource: "percentiles" }}
      />,
    );
    const y = tickMap(container, "y");
    const bar = container.querySelector('[data-bin="2036-2045"]')!;
    // 33 % of members over 9 years -> 3.667 % per year
    expect(Number(bar.getAttribute("y"))).toBeCloseTo(y(33 / 9), 6);
    // "Never" is a share of all members, not a rate per year: it is not drawn in the histogram's SVG.
    expect(container.querySelector("svg")!.textContent).not.toContain("never");
    const never = container.querySelector('[data-testid="never-share"]')!;
    expect(never).toHaveTextContent("Never cross by 2100");
    expect(never).toHaveTextContent("79 %");
    expect(never).toHaveTextContent("of all members");
    expect(never.querySelector('[role="meter"]')).toHaveAttribute("aria-valuenow", "79");
  });

  it("draws one bar per year from per-year first-crossing shares", () => {
    const bins = crossingBinsPerYear([2030, 2031, 2032, 2033], [0, 0.2, 0.5, 0.1]);
    expect(bins).toEqual([
      { from: 2031, to: 2032, share: 0.2 },
      { from: 2032, to: 2033, share: 0.5 },
      { from: 2033, to: 2034, share: 0.1 },
    ]);
    const { container } = render(
      <CrossingHistogram title="Crossing 2 K" crossing={{ threshold: 2, percentiles: { p50: 2032 }, never: 0.2, bins, binSource: "per-year" }} />,
    );
    const y = tickMap(container, "y");
    // A one-year bar's height is its share in % per year: 0.5 -> 50 % per year.
    expect(Number(container.querySelector('[data-bin="2032-2033"]')!.getAttribute("y"))).toBeCloseTo(y(50), 6);
    expect(container.querySelectorAll("[data-bin]")).toHaveLength(3);
  });
});

describe("ForcingBreakdownChart", () => {
  it("places the 5–95 bracket ends at p5 and p95 on the forcing axis", () => {
    const agents = [
      { agent: "co2", label: "CO2", p5: 1.8, p50: 2.1, p95: 2.4 },
      { agent: "aerosol-cloud", label: "Aerosol–cloud", p5: -1.7, p50: -0.9, p95: -0.3 },
    ];
    const { container } = render(<ForcingBreakdownChart title="Forcing 2020" year={2020} agents={agents} />);
    const x = tickMap(container, "x");
    for (const a of agents) {
      const lines = container.querySelectorAll(`[data-agent="${a.agent}"] [data-role="bracket"] line`);
      expect(Number(lines[0]!.getAttribute("x1"))).toBeCloseTo(x(a.p5), 6);
      expect(Number(lines[0]!.getAttribute("x2"))).toBeCloseTo(x(a.p95), 6);
      const bar = container.querySelector(`[data-agent="${a.agent}"] [data-role="median-bar"]`)!;
      expect(Number(bar.getAttribute("width"))).toBeCloseTo(Math.abs(x(a.p50) - x(0)), 6);
    }
    expect(container.textContent).toContain("Effective radiative forcing (W m-2)");
  });
});

describe("ForcingStackChart", () => {
  it("draws the total line at the sum of the agents", () => {
    const years = [2000, 2001, 2002];
    const agents = [
      { agent: "co2", label: "CO2", values: [1, 1.5, 2] },
      { agent: "aerosol-cloud", label: "Aerosol–cloud", values: [-0.5, -0.6, -0.7] },
    ];
    const { container } = render(<ForcingStackChart title="Forcing" years={years} agents={agents} />);
    const y = tickMap(container, "y");
    const total = pathPoints(container.querySelector('[data-role="total"]')!.getAttribute("d")!);
    // d3-path rounds coordinates to 3 decimals
    [0.5, 0.9, 1.3].forEach((v, i) => expect(total[i]![1]).toBeCloseTo(y(v), 2));
    // Cooling agent is stacked below zero: its area lies under the zero line.
    const cooling = pathPoints(container.querySelector('[data-agent="aerosol-cloud"]')!.getAttribute("d")!);
    cooling.forEach(([, py]) => expect(py).toBeGreaterThanOrEqual(y(0) - 1e-3));
  });
});

describe("SensitivityBars", () => {
  it("orders inputs by the size of their index, largest first", () => {
    const { container } = render(
      <SensitivityBars
        title="Sensitivity"
        horizon={2100}
        bars={[
          { input: "f2x", label: "F2x", index: 0.2 },
          { input: "ecs", label: "ECS", index: 0.8 },
          { input: "aerosol-cloud", label: "Aerosol–cloud", index: -0.4 },
        ]}
      />,
    );
    const order = [...container.querySelectorAll("[data-input]")].map((g) => g.getAttribute("data-input"));
    expect(order).toEqual(["ecs", "aerosol-cloud", "f2x"]);
  });

  it("prints the longest input name in full instead of cutting it", () => {
    // Longest label inputLabel() makes: an agent name from contracts' AGENT_LABELS plus " scale".
    const { container } = render(<SensitivityBars title="Sensitivity" horizon={2100} bars={[{ input: "other-wmghg", label: inputLabel("other-wmghg"), index: 0.04 }]} />);
    const labels = [...container.querySelectorAll(".axis-band text")].map((t) => t.textContent);
    expect(labels).toEqual(["Other well-mixed gases scale"]);
  });
});
