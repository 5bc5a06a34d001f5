import { render, screen, within } from "@testing-library/react";
import { modelVersionImpactSchema } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { impactFixture } from "../testing/impact-fixture";
import { ImpactSummaryView } from "./impact-summary-view";

const rowOf = (table: HTMLElement, first: string) => within(table).getAllByRole("row").find((r) => within(r).queryAllByRole("cell")[0]?.textContent === first)!;

describe("ImpactSummaryView", () => {
  it("the fixture has the API's shape", () => {
    expect(modelVersionImpactSchema.safeParse(impactFixture()).success).toBe(true);
  });

  it("puts both versions' medians and 5–95 ranges side by side and highlights a shift beyond the preview noise", () => {
    render(<ImpactSummaryView impact={impactFixture()} />);
    const table = screen.getByRole("table", { name: "Warming at the horizons on Harbourline Middle" });
    const headers = within(table).getAllByRole("columnheader").map((h) => h.textContent);
    expect(headers).toEqual(["Year", "Core v2", "Core v3", "Median shift", "5–95 width change"]);
    const r2100 = rowOf(table, "2100");
    const cells = within(r2100).getAllByRole("cell").map((c) => c.textContent);
    expect(cells.slice(1, 3)).toEqual(["2.60 (2.00–3.60)", "2.90 (2.10–4.10)"]);
    const shift = within(r2100).getByText("+0.30 K");
    expect(shift.className).toContain("text-danger"); // warmer, and 0.30 > √2 × 0.03 ≈ 0.042 K
    // 2050 moves 0.02 K: inside the combined ±0.042 K noise, so it is greyed and says so.
    const r2050 = rowOf(table, "2050");
    expect(within(r2050).getByText(/\+0\.02 K/).className).toContain("text-muted");
    // The width change (+0.05 K) is also inside its noise (twice the median noise, ≈ 0.085 K).
    expect(within(r2050).getAllByText(/within preview noise/)).toHaveLength(2);
  });

  it("shows exceedance probabilities per threshold and implied ECS/TCR with their changes", () => {
    render(<ImpactSummaryView impact={impactFixture()} />);
    const exceed = screen.getByRole("table", { name: "Exceedance probabilities on Harbourline Middle" });
    const row = within(exceed).getAllByRole("row").find((r) => r.textContent?.startsWith("2100> 3 K"))!;
    expect(within(row).getAllByRole("cell").map((c) => c.textContent)).toEqual(["2100", "> 3 K", "20 %", "35 %", "+15.0 pts"]);
    const sens = screen.getByRole("table", { name: "Implied climate sensitivity" });
    const ecs = rowOf(sens, "Equilibrium climate sensitivity (ECS)");
    expect(within(ecs).getAllByRole("cell").map((c) => c.textContent)).toEqual([
      "Equilibrium climate sensitivity (ECS)",
      "3.00 (2.00–5.00)",
      "3.40 (2.20–5.60)",
      "+0.40 K",
      "+0.40 K",
    ]);
  });

  it("shows every previewed pathway in its own section, in the order of the answer", () => {
    render(<ImpactSummaryView impact={impactFixture()} />);
    expect(screen.getAllByRole("heading", { level: 3 }).map((h) => h.textContent)).toEqual(["On Harbourline Middle", "On Harbourline Low"]);
    const low = screen.getByRole("table", { name: "Warming at the horizons on Harbourline Low" });
    expect(within(rowOf(low, "2100")).getAllByRole("cell").map((c) => c.textContent).slice(1, 3)).toEqual(["1.75 (1.40–2.35)", "1.80 (1.40–2.40)"]);
  });

  it("lists each materiality threshold that fired, and says when the author classed it minor", () => {
    render(<ImpactSummaryView impact={impactFixture()} changeClass="minor" />);
    const box = screen.getByRole("region", { name: "Materiality" });
    expect(box).toHaveTextContent("4 materiality thresholds fired — yet the change is classed as minor");
    expect(within(box).getAllByRole("listitem").map((li) => li.textContent)).toEqual([
      "fired: median shift +0.30 K > 0.1 K on Harbourline Middle 2100",
      "fired: 5–95 % width change +25.0 % > 10 % on Harbourline Middle 2100",
      "fired: P(>2 K) change +10.0 pts > 5 pts on Harbourline Middle 2100",
      "fired: P(>3 K) change +15.0 pts > 5 pts on Harbourline Middle 2100",
    ]);
  });

  it("says so quietly when nothing fired", () => {
    const base = impactFixture();
    render(<ImpactSummaryView impact={{ ...base, materiality: { ...base.materiality, fired: [] } }} />);
    expect(screen.getByLabelText("Materiality")).toHaveTextContent("No materiality threshold fired on the previewed pathways");
  });

  it("names the pathways and member count and states the Monte Carlo precision of a small preview", () => {
    render(<ImpactSummaryView impact={impactFixture()} />);
    expect(screen.getByText("Harbourline Middle, Harbourline Low")).toBeInTheDocument();
    const note = screen.getByRole("note");
    expect(note).toHaveTextContent("2,000 members per version");
    // Median: half of the fixture's 0.06 K wide interval. Exceedance: 1.96·√(0.25/2000) = 0.0219 (binomial, p = ½).
    expect(note).toHaveTextContent("±0.03 K");
    expect(note).toHaveTextContent("±2.2 points");
    expect(note).toHaveTextContent("Computed in 3.2 s");
  });

  it("greys a change that rounds to zero instead of flagging a '+0.00 K' warming", () => {
    // Same seed and same ECS range: the sampled ECS median moves by 0.001 K, which shows as 0.00.
    const base = impactFixture();
    render(<ImpactSummaryView impact={{ ...base, differences: { ...base.differences, ecs: { medianShift: 0.001, widthChange: 0.5 } } }} />);
    const ecs = rowOf(screen.getByRole("table", { name: "Implied climate sensitivity" }), "Equilibrium climate sensitivity (ECS)");
    const [, , , median, width] = within(ecs).getAllByRole("cell");
    expect(median).toHaveTextContent("±0.00 K (no change)");
    expect(median!.firstElementChild!.className).toContain("text-muted");
    expect(width!.firstElementChild!.className).toContain("text-danger"); // a real widening stays red
  });
});
