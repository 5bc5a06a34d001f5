import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { tickMap } from "@/testing/svg-geometry";
import { AalBandChart } from "./aal-band-chart";

const s = (p5: number, p17: number, p50: number, p83: number, p95: number) => ({ p5, p17, p50, p83, p95, mean: p50 });
const horizons = [
  { year: 2050, summary: s(18.2e6, 18.9e6, 19.5e6, 20.3e6, 21e6) },
  { year: 2100, summary: s(18.8e6, 19.6e6, 20.4e6, 21.3e6, 22e6) },
];
const plotHeight = 280 - 12 - 44; // height minus DEFAULT_MARGINS top and bottom

describe("AalBandChart", () => {
  it("spans an 18–22 m band and today's AAL instead of starting at zero, and says so on the axis", () => {
    const { container } = render(<AalBandChart title="AAL" currency="EUR" baselineAal={17.5e6} horizons={horizons} />);
    const ticks = [...container.querySelectorAll(".axis-y [data-tick]")].map((t) => Number(t.getAttribute("data-tick")));
    expect(Math.min(...ticks)).toBeGreaterThan(0);
    expect(container.querySelector(".axis-y .axis-label")).toHaveTextContent("AAL (EUR), axis not from 0");
    expect(container.querySelector('[data-testid="axis-break"]')).not.toBeNull();
    expect(screen.getByText(/does not start at zero/)).toBeInTheDocument();

    // The 2100 5–95 % bar sits where the rendered axis puts 18.8 m and 22 m, and is tall, not a slab.
    const y = tickMap(container, "y");
    const outer = container.querySelector('[data-horizon="2100"] [data-band="p5-p95"]')!;
    const top = Number(outer.getAttribute("y"));
    const height = Number(outer.getAttribute("height"));
    expect(top).toBeCloseTo(y(22e6), 6);
    expect(top + height).toBeCloseTo(y(18.8e6), 6);
    expect(height).toBeGreaterThan(plotHeight / 3); // from zero it would be 3.2 / 24 of the plot

    // Today's AAL, below every projection, is still inside the plot.
    const baseline = Number(container.querySelector('[data-testid="baseline-aal"] line')!.getAttribute("y1"));
    expect(baseline).toBeCloseTo(y(17.5e6), 6);
    expect(baseline).toBeGreaterThanOrEqual(0);
    expect(baseline).toBeLessThanOrEqual(plotHeight);
  });

  it("keeps zero on the axis when the losses come near it", () => {
    const { container } = render(<AalBandChart title="AAL" currency="EUR" baselineAal={100} horizons={[{ year: 2050, summary: s(50, 200, 400, 800, 1500) }]} />);
    const ticks = [...container.querySelectorAll(".axis-y [data-tick]")].map((t) => Number(t.getAttribute("data-tick")));
    expect(Math.min(...ticks)).toBe(0);
    expect(container.querySelector(".axis-y .axis-label")).toHaveTextContent("Average annual loss (EUR)");
    expect(container.querySelector('[data-testid="axis-break"]')).toBeNull();
  });
});
