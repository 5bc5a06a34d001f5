import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { tickMap } from "@/testing/svg-geometry";
import { INTERACTIONS_LABEL, VarianceShareBars, varianceBudget, type VarianceShareRow } from "./variance-share-bars";

/**
 * Fixtures from closed forms (Sobol 1993; Saltelli et al. 2008, The Primer, ch. 4 — from memory):
 * * additive Y = 2·X1 + X2, X1, X2 independent N(0, 1): Var Y = 5, S1 = 4/5, S2 = 1/5, no
 *   interaction;
 * * Y = X1 + X2 + X1·X2, same inputs: Var Y = 1 + 1 + 1 = 3, S1 = S2 = 1/3, and the product
 *   term's 1/3 is pure interaction.
 * Rank correlations are invented (signs chosen to show both directions).
 */
const ADDITIVE: VarianceShareRow[] = [
  { input: "x2", label: "X2", share: 1 / 5, rankCorrelation: -0.43 },
  { input: "x1", label: "X1", share: 4 / 5, rankCorrelation: 0.87 },
];
const WITH_PRODUCT: VarianceShareRow[] = [
  { input: "x1", label: "X1", share: 1 / 3, rankCorrelation: 0.55 },
  { input: "x2", label: "X2", share: 1 / 3, rankCorrelation: 0.55 },
];

const shareRect = (container: Element, input: string) => container.querySelector(`[data-input="${input}"] [data-role="share"]`)!;

describe("VarianceShareBars", () => {
  it("draws each input's share on one 0–100 % axis, largest first, with no remainder for an additive model", () => {
    const { container } = render(<VarianceShareBars title="What drives the spread" horizon={2100} rows={ADDITIVE} />);
    const x = tickMap(container, "x");
    expect([...container.querySelectorAll("[data-input]")].map((g) => g.getAttribute("data-input"))).toEqual(["x1", "x2", "interactions"]);
    for (const r of ADDITIVE) {
      const rect = shareRect(container, r.input);
      expect(Number(rect.getAttribute("x"))).toBeCloseTo(x(0), 6);
      expect(Number(rect.getAttribute("width"))).toBeCloseTo(x(r.share) - x(0), 6);
    }
    expect(Number(shareRect(container, "interactions").getAttribute("width"))).toBeCloseTo(0, 9);
    expect(container.querySelector('[data-input="x2"] [data-role="rank-correlation"]')).toHaveTextContent("−0.43");
    expect(container.querySelector('[data-input="x1"] [data-role="rank-correlation"]')).toHaveTextContent("+0.87");
    expect(screen.queryByRole("note")).toBeNull();
  });

  it("labels what the first-order shares leave as interactions, so the bars add up to 100 %", () => {
    const { container } = render(<VarianceShareBars title="What drives the spread" horizon={2100} rows={WITH_PRODUCT} />);
    const x = tickMap(container, "x");
    const widths = ["x1", "x2", "interactions"].map((i) => Number(shareRect(container, i).getAttribute("width")));
    expect(widths[2]).toBeCloseTo(x(1 / 3) - x(0), 6);
    expect(widths.reduce((a, b) => a + b, 0)).toBeCloseTo(x(1) - x(0), 6);
    expect(container.querySelector('[data-input="interactions"]')).toHaveTextContent("33 %");
    expect(container.querySelector(".axis-band")).toHaveTextContent(INTERACTIONS_LABEL);
  });

  it("never draws a negative remainder when estimated shares overshoot 100 % by noise, and says so", () => {
    const rows = [
      { input: "a", label: "A", share: 0.7, rankCorrelation: 0.8 },
      { input: "b", label: "B", share: 0.35, rankCorrelation: 0.5 },
    ];
    expect(varianceBudget(rows)).toMatchObject({ sum: expect.closeTo(1.05, 12), remainder: 0 });
    const { container } = render(<VarianceShareBars title="Spread" horizon={2050} rows={rows} />);
    expect(Number(shareRect(container, "interactions").getAttribute("width"))).toBe(0);
    expect(screen.getByRole("note")).toHaveTextContent("add up to 105 %");
  });

  it("offers the same numbers as a table", async () => {
    render(<VarianceShareBars title="What drives the spread" horizon={2100} rows={WITH_PRODUCT} />);
    await userEvent.click(screen.getByRole("button", { name: "Show table" }));
    const table = screen.getByRole("table");
    expect(within(table).getAllByRole("columnheader").map((c) => c.textContent)).toEqual(["Input", "Share of variance (first order)", "Rank correlation (Spearman)"]);
    const rows = within(table).getAllByRole("row").slice(1).map((r) => within(r).getAllByRole("cell").map((c) => c.textContent));
    expect(rows).toEqual([
      ["X1", "33 %", "+0.55"],
      ["X2", "33 %", "+0.55"],
      [INTERACTIONS_LABEL, "33 %", "–"],
    ]);
  });
});
