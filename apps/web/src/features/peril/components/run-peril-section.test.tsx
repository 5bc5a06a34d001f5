import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { perilResultFixture } from "../testing/peril-fixtures";
import { RunPerilSection } from "./run-peril-section";

const pathways = [{ id: "p1", name: "Middle road" }] as never;

describe("RunPerilSection", () => {
  it("renders nothing for a run without peril profiles", () => {
    const { container } = render(<RunPerilSection run={{ manifest: { spec: {} } } as never} result={{ pathways, perils: undefined }} />);
    expect(container).toBeEmptyDOMElement();
  });

  it("draws today's AAL from the portfolio rows copied into the run's spec", () => {
    const spec = { portfolio: { id: "pf-1", name: "x", rows: [{ region: "Northmere Coast", peril: "flood-heavy-rainfall", currency: "EUR", aal: 1000, loss100: 1, loss200: 2 }] } };
    const { container } = render(<RunPerilSection run={{ manifest: { spec } } as never} result={{ pathways, perils: perilResultFixture() }} />);
    expect(screen.getByRole("heading", { name: "Peril lens" })).toBeInTheDocument();
    const today = container.querySelector('[data-testid="baseline-aal"]');
    expect(today).toHaveTextContent("1k"); // en-GB compact notation of 1000
    expect(today).toHaveTextContent("Today");
  });
});
