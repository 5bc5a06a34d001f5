import { fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { fanFixture } from "@/testing/fixtures";
import { pathPoints, tickMap } from "@/testing/svg-geometry";
import { FanChart } from "./fan-chart";

// d3-path writes coordinates rounded to 3 decimals, so pixel positions agree to 1e-3.
const TOL = 1e-3;

describe("FanChart", () => {
  it("draws the 5–95 band exactly between the p95 and p5 values the axis places", () => {
    const s = fanFixture();
    const { container } = render(<FanChart title="Warming" series={[s]} yLabel="Warming above 1850–1900 (K)" unit="K" />);
    const y = tickMap(container, "y");
    const x = tickMap(container, "x");
    const pts = pathPoints(container.querySelector('[data-band="p5-p95"]')!.getAttribute("d")!);
    const n = s.years.length;
    expect(pts).toHaveLength(2 * n);
    // d3.area writes the top edge (y1 = p95) forwards, then the bottom edge (y0 = p5) backwards.
    for (let i = 0; i < n; i++) {
      expect(Math.abs(pts[i]![0] - x(s.years[i]!))).toBeLessThan(TOL);
      expect(Math.abs(pts[i]![1] - y(s.p95[i]!))).toBeLessThan(TOL);
      expect(Math.abs(pts[2 * n - 1 - i]![1] - y(s.p5[i]!))).toBeLessThan(TOL);
    }
  });

  it("draws the 17–83 band and the median at their percentiles", () => {
    const s = fanFixture();
    const { container } = render(<FanChart title="Warming" series={[s]} yLabel="Warming (K)" unit="K" />);
    const y = tickMap(container, "y");
    const inner = pathPoints(container.querySelector('[data-band="p17-p83"]')!.getAttribute("d")!);
    const median = pathPoints(container.querySelector('[data-band="p50"]')!.getAttribute("d")!);
    const n = s.years.length;
    for (let i = 0; i < n; i++) {
      expect(Math.abs(inner[i]![1] - y(s.p83[i]!))).toBeLessThan(TOL);
      expect(Math.abs(inner[2 * n - 1 - i]![1] - y(s.p17[i]!))).toBeLessThan(TOL);
      expect(Math.abs(median[i]![1] - y(s.p50[i]!))).toBeLessThan(TOL);
    }
  });

  it("labels its axes with units", () => {
    const { container } = render(<FanChart title="Warming" series={[fanFixture()]} yLabel="Warming above 1850–1900 (K)" unit="K" />);
    const labels = [...container.querySelectorAll(".axis-label")].map((e) => e.textContent);
    expect(labels).toContain("Warming above 1850–1900 (K)");
    expect(labels).toContain("Year");
  });

  it("toggles a pathway off and on", () => {
    const { container } = render(
      <FanChart title="Warming" series={[fanFixture("a", "Low road"), fanFixture("b", "High road", 1)]} yLabel="Warming (K)" unit="K" />,
    );
    expect(container.querySelectorAll("[data-series]")).toHaveLength(2);
    fireEvent.click(screen.getByRole("button", { name: /High road/ }));
    expect(container.querySelector('[data-series="b"]')).toBeNull();
    expect(screen.getByRole("button", { name: /High road/ })).toHaveAttribute("aria-pressed", "false");
    fireEvent.click(screen.getByRole("button", { name: /High road/ }));
    expect(container.querySelector('[data-series="b"]')).not.toBeNull();
  });

  it("reads out a year's percentiles from the keyboard", () => {
    render(<FanChart title="Warming" series={[fanFixture()]} yLabel="Warming (K)" unit="K" />);
    const overlay = screen.getByLabelText(/arrow keys/);
    fireEvent.keyDown(overlay, { key: "ArrowRight" }); // first step lands on 2001 (years are per decade: no row)
    fireEvent.keyDown(overlay, { key: "ArrowLeft" }); // back to 2000
    const status = screen.getByRole("status");
    expect(status).toHaveTextContent("2000");
    // 2000: p50 = 1, 17–83 = 0.70–1.35, 5–95 = 0.40–1.80 (fixture arithmetic)
    expect(status).toHaveTextContent("median 1.00 K");
    expect(status).toHaveTextContent("17th–83rd 0.70–1.35");
    expect(status).toHaveTextContent("5th–95th 0.40–1.80");
  });

  it("marks the observed window and offers the numbers as a table", () => {
    const { container } = render(
      <FanChart title="Warming" series={[fanFixture()]} yLabel="Warming (K)" unit="K" observedWindow={{ from: 2011, to: 2020, observed: 1.09 }} />,
    );
    expect(container.querySelector('[data-testid="observed-window"]')).not.toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Show table" }));
    expect(screen.getByRole("table")).toHaveTextContent("50 % (K)");
    expect(screen.getByRole("table")).toHaveTextContent("2100");
  });

  it("draws an outlined series as band edges with a dashed median, on top of a filled one", () => {
    const filled = fanFixture("a", "Left run");
    const outlined = { ...fanFixture("b", "Right run", 0.2), treatment: "outline" as const };
    const { container } = render(<FanChart title="Both" series={[outlined, filled]} yLabel="Warming (K)" unit="K" />);
    const groups = [...container.querySelectorAll("[data-series]")];
    // Drawn last, whatever the order given, so its edges are never under the other's tint.
    expect(groups.map((g) => g.getAttribute("data-series"))).toEqual(["a", "b"]);
    const b = container.querySelector('[data-series="b"]')!;
    for (const band of ["p5-p95", "p17-p83"]) expect(b.querySelector(`[data-band="${band}"]`)).toHaveAttribute("fill", "none");
    // The outline is the band's two edges, p95 then p5, as two open lines (no closing stroke).
    const y = tickMap(container, "y");
    const outerD = b.querySelector('[data-band="p5-p95"]')!.getAttribute("d")!;
    expect(outerD.match(/M/g)).toHaveLength(2);
    const pts = pathPoints(outerD);
    const n = outlined.years.length;
    for (let i = 0; i < n; i++) {
      expect(Math.abs(pts[i]![1] - y(outlined.p95[i]!))).toBeLessThan(TOL);
      expect(Math.abs(pts[n + i]![1] - y(outlined.p5[i]!))).toBeLessThan(TOL);
    }
    expect(b.querySelector('[data-band="p50"]')!.getAttribute("stroke-dasharray")).toBeTruthy();
    const a = container.querySelector('[data-series="a"]')!;
    expect(a.querySelector('[data-band="p17-p83"]')!.getAttribute("fill")).not.toBe("none");
    expect(a.querySelector('[data-band="p50"]')!.getAttribute("stroke-dasharray")).toBeNull();
    // The legend keys differ too: a dashed line for the outlined series only.
    const key = (name: RegExp) => screen.getByRole("button", { name }).querySelector("line")!.getAttribute("stroke-dasharray");
    expect(key(/Right run/)).toBeTruthy();
    expect(key(/Left run/)).toBeNull();
  });

  it("reads out above the plot, never over it, showing the last year until a year is pointed at", () => {
    const { container } = render(<FanChart title="Warming" series={[fanFixture()]} yLabel="Warming (K)" unit="K" thresholds={[1.5, 2, 3]} />);
    const status = screen.getByRole("status");
    const svg = container.querySelector("svg[role=img]")!;
    // Outside the box that holds the plot, and before it: it cannot cover threshold labels.
    expect(status.contains(svg) || svg.parentElement!.contains(status)).toBe(false);
    expect(status.compareDocumentPosition(svg) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    // 2100 (i = 10): median 1 + 0.2 × 10 = 3.00, 17–83 2.70–3.35, 5–95 2.40–3.80 (fixture arithmetic)
    expect(status).toHaveTextContent("2100");
    expect(status).toHaveTextContent("median 3.00 K");
    expect(status).toHaveTextContent("5th–95th 2.40–3.80");
  });
});

