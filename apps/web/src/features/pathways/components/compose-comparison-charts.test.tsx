import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import type { PathwayData } from "@plumeline/contracts";
import { ComposeComparisonCharts } from "./compose-comparison-charts";

// Invented: five agents over 2000–2001, then the same extended to 2003 (every agent changed).
const flat = (v: number, n: number) => Array<number>(n).fill(v);
const agents = (n: number): PathwayData["agents"] => ({
  co2: { erf: flat(2, n) },
  ch4: { erf: flat(0.5, n) },
  n2o: { erf: flat(0.2, n) },
  ozone: { erf: flat(0.4, n) },
  solar: { erf: flat(0, n) },
});
const base: PathwayData = { startYear: 2000, agents: agents(2) };
const extended: PathwayData = { startYear: 2000, agents: agents(4) };

describe("ComposeComparisonCharts", () => {
  it("draws net forcing, base against composed, breaking the base's line where it has no years", () => {
    const { container } = render(
      <ComposeComparisonCharts
        base={base}
        baseLabel="Base"
        composed={extended}
        composedLabel="Composed"
        changed={["co2"]}
        titlePrefix="Step 1"
      />,
    );
    expect(screen.getByRole("figure", { name: "Step 1: net forcing" })).toBeInTheDocument();
    const basePath = container.querySelector('[data-series="base"]')!.getAttribute("d")!;
    const composedPath = container.querySelector('[data-series="composed"]')!.getAttribute("d")!;
    expect(basePath).not.toContain("NaN");
    // d3's line: one moveTo per unbroken run; the base covers 2 of the 4 years, the composed all 4.
    expect(basePath.match(/L/g)).toHaveLength(1);
    expect(composedPath.match(/L/g)).toHaveLength(3);
  });

  it("shows the first four changed agents, and all of them on request", async () => {
    render(
      <ComposeComparisonCharts
        base={base}
        baseLabel="Base"
        composed={extended}
        composedLabel="Composed"
        changed={["co2", "ch4", "n2o", "ozone", "solar"]}
        titlePrefix="Step 2"
      />,
    );
    expect(screen.getAllByRole("figure")).toHaveLength(5); // net forcing + the first four agents
    expect(screen.queryByRole("figure", { name: "Step 2: Solar (W m-2)" })).toBeNull();
    expect(screen.getByRole("figure", { name: "Step 2: Ozone (W m-2)" })).toBeInTheDocument();
    await userEvent.click(screen.getByRole("button", { name: "Show all 5 changed agents" }));
    expect(screen.getByRole("figure", { name: "Step 2: Solar (W m-2)" })).toBeInTheDocument();
    expect(screen.getAllByRole("figure")).toHaveLength(6);
  });
});
