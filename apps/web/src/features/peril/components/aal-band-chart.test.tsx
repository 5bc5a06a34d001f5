import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { tickMap } from "@/testing/svg-geometry";
import { AalBandChart } from "./aal-band-chart";

const s = (p5: number, p17: number, p50: number, p83: number, p95: number) => ({ p5, p17, p50, p83, p95, mean: p50 });
const horizons = [
  { year: 2050, summary: s(18.2e6, 18.9e6, 19.5e6, 20.3e6, 21e6) },
  { year: 2100, summary: s(18.8e6, 19.6e6, 20.4e6, 21.3e6, 22e6) },
];
const plotHeight = 300 - 12 - 58; // the chart's height minus its top and bottom margins
const num = (el: Element | null, attr: string) => Number(el!.getAttribute(attr));

describe("AalBandChart", () => {
  it("spans an 18–22 m range and today's AAL instead of starting at zero, and says so on the axis", () => {
    const { container } = render(<AalBandChart title="AAL" currency="EUR" baselineAal={17.5e6} horizons={horizons} />);
    const ticks = [...container.querySelectorAll(".axis-y [data-tick]")].map((t) => Number(t.getAttribute("data-tick")));
    expect(Math.min(...ticks)).toBeGreaterThan(0);
    expect(container.querySelector(".axis-y .axis-label")).toHaveTextContent("AAL (EUR), axis not from 0");
    expect(container.querySelector('[data-testid="axis-break"]')).not.toBeNull();
    expect(screen.getByText(/does not start at zero/)).toBeInTheDocument();

    // Each 2100 mark sits where the rendered axis puts its percentile (read back from the ticks).
    const y = tickMap(container, "y");
    const h2100 = container.querySelector('[data-horizon="2100"]')!;
    const whisker = h2100.querySelector('[data-range="p5-p95"]');
    expect(num(whisker, "y1")).toBeCloseTo(y(22e6), 6);
    expect(num(whisker, "y2")).toBeCloseTo(y(18.8e6), 6);
    expect(num(whisker, "y2") - num(whisker, "y1")).toBeGreaterThan(plotHeight / 3); // from zero it would be 3.2 / 24 of the plot
    const bar = h2100.querySelector('[data-range="p17-p83"]');
    expect(num(bar, "y")).toBeCloseTo(y(21.3e6), 6);
    expect(num(bar, "y") + num(bar, "height")).toBeCloseTo(y(19.6e6), 6);
    expect(num(h2100.querySelector('[data-point="p50"]'), "cy")).toBeCloseTo(y(20.4e6), 6);

    // Today's AAL, below every projection, is still inside the plot: its square is centred on y(17.5 m).
    const square = container.querySelector('[data-testid="baseline-aal"] [data-point="today"]');
    const squareMid = num(square, "y") + num(square, "height") / 2;
    expect(squareMid).toBeCloseTo(y(17.5e6), 6);
    expect(squareMid).toBeGreaterThanOrEqual(0);
    expect(squareMid).toBeLessThanOrEqual(plotHeight);
  });

  it("draws each horizon as one centred dot-and-range in its own column after a Today column, so no marks cross", () => {
    const { container } = render(<AalBandChart title="AAL" currency="EUR" baselineAal={17.5e6} horizons={horizons} />);
    const square = container.querySelector('[data-point="today"]');
    const todayX = num(square, "x") + num(square, "width") / 2;
    const columns = horizons.map(({ year }) => {
      const g = container.querySelector(`[data-horizon="${year}"]`)!;
      const whisker = g.querySelector('[data-range="p5-p95"]');
      const bar = g.querySelector('[data-range="p17-p83"]');
      const dot = g.querySelector('[data-point="p50"]');
      // A vertical whisker, and the bar and the dot centred on it: one column, not a cross of two widths.
      expect(num(whisker, "x1")).toBe(num(whisker, "x2"));
      expect(num(bar, "x") + num(bar, "width") / 2).toBeCloseTo(num(whisker, "x1"), 6);
      expect(num(dot, "cx")).toBeCloseTo(num(whisker, "x1"), 6);
      return { x: num(whisker, "x1"), left: num(bar, "x"), right: num(bar, "x") + num(bar, "width") };
    });
    expect(todayX).toBeLessThan(columns[0]!.left);
    expect(columns[0]!.right).toBeLessThan(columns[1]!.left);

    // The median's change against today, written under the year: 19.5/17.5 − 1 = 11.4 %, 20.4/17.5 − 1 = 16.6 %.
    expect([...container.querySelectorAll("[data-change]")].map((t) => t.textContent)).toEqual(["median +11 %", "median +17 %"]);
    const legend = within(screen.getByRole("list", { name: "Legend" })).getAllByRole("listitem").map((li) => li.textContent);
    expect(legend).toEqual(["Median (50th pct)", "17th–83rd pct", "5th–95th pct", "Today's AAL (portfolio baseline)"]);
  });

  it("leaves out the Today column, its legend entry and the change when today's AAL is unknown", () => {
    const { container } = render(<AalBandChart title="AAL" currency="EUR" horizons={horizons} />);
    expect(container.querySelector('[data-testid="baseline-aal"]')).toBeNull();
    expect(container.querySelector("[data-change]")).toBeNull();
    expect(within(screen.getByRole("list", { name: "Legend" })).getAllByRole("listitem")).toHaveLength(3);
  });

  it("keeps zero on the axis when the losses come near it", () => {
    const { container } = render(<AalBandChart title="AAL" currency="EUR" baselineAal={100} horizons={[{ year: 2050, summary: s(50, 200, 400, 800, 1500) }]} />);
    const ticks = [...container.querySelectorAll(".axis-y [data-tick]")].map((t) => Number(t.getAttribute("data-tick")));
    expect(Math.min(...ticks)).toBe(0);
    expect(container.querySelector(".axis-y .axis-label")).toHaveTextContent("Average annual loss (EUR)");
    expect(container.querySelector('[data-testid="axis-break"]')).toBeNull();
  });

  it("offers the same numbers as a table, with today's AAL and the median's change", async () => {
    render(<AalBandChart title="AAL 2050–2100" currency="EUR" baselineAal={17.5e6} horizons={horizons} />);
    await userEvent.click(screen.getByRole("button", { name: "Show table" }));
    const table = screen.getByRole("table", { name: "AAL 2050–2100" });
    const [head, , row2100] = within(table).getAllByRole("row");
    expect(within(head!).getAllByRole("columnheader").map((c) => c.textContent)).toEqual([
      "Horizon",
      "Today (EUR m)",
      "5th pct (EUR m)",
      "17th pct (EUR m)",
      "50th pct (EUR m)",
      "83rd pct (EUR m)",
      "95th pct (EUR m)",
      "Mean (EUR m)",
      "Median vs today",
    ]);
    expect(within(row2100!).getAllByRole("cell").map((c) => c.textContent)).toEqual([
      // Money in one scale (EUR m) at three significant figures.
      "2100",
      "17.5",
      "18.8",
      "19.6",
      "20.4",
      "21.3",
      "22.0",
      "20.4",
      "+17 %",
    ]);
  });
});
