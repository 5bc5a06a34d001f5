import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { DistributionEditor } from "./distribution-editor";

describe("DistributionEditor", () => {
  it("shows the 5/17/50/83/95 values of the distribution as typed", async () => {
    const onChange = vi.fn();
    render(<DistributionEditor id="ecs" label="ECS" unit="K" value={{ type: "normal", mean: 3, sd: 1 }} onChange={onChange} />);
    const table = screen.getByRole("table", { name: "ECS: percentiles of the distribution" });
    // N(3, 1): 95th percentile = 3 + qnorm(0.95) = 4.645 (R: qnorm(0.95) = 1.644854)
    expect(within(table).getAllByRole("cell").map((c) => c.textContent)).toEqual(["1.355", "2.046", "3.000", "3.954", "4.645"]);
    await userEvent.clear(screen.getByLabelText("Mean"));
    await userEvent.type(screen.getByLabelText("Mean"), "2");
    expect(within(table).getAllByRole("cell")[2]).toHaveTextContent("2.000");
    expect(onChange).toHaveBeenLastCalledWith({ type: "normal", mean: 2, sd: 1 });
  });

  it("names the bad parameter beside its field and reports the input as invalid", async () => {
    const onChange = vi.fn();
    render(<DistributionEditor id="ecs" label="ECS" unit="K" value={{ type: "normal", mean: 3, sd: 1 }} onChange={onChange} />);
    await userEvent.clear(screen.getByLabelText("Standard deviation"));
    await userEvent.type(screen.getByLabelText("Standard deviation"), "-1");
    // Message from the contracts distribution schema.
    expect(screen.getByLabelText("Standard deviation")).toHaveAccessibleDescription("must be > 0");
    expect(onChange).toHaveBeenLastCalledWith(null);
    expect(screen.getByText("Preview shows the last valid values.")).toBeInTheDocument();
  });

  it("enters an assessed range and reproduces its ends at 5 and 95 %", async () => {
    render(<DistributionEditor id="ecs" label="ECS" unit="K" value={{ type: "normal", mean: 3, sd: 1 }} onChange={() => {}} />);
    await userEvent.click(screen.getByRole("button", { name: "AR6: 3 K, 5th–95th pct 2–5 K" }));
    const cells = within(screen.getByRole("table", { name: /percentiles/ })).getAllByRole("cell").map((c) => c.textContent);
    // A range fit reproduces its published points (IPCC 2021, AR6 WG1 SPM A.4.4: 3 K, “very likely range” 2–5 K).
    expect([cells[0], cells[2], cells[4]]).toEqual(["2.000", "3.000", "5.000"]);
    expect(screen.getByLabelText("Range covers")).toHaveValue("90");
  });

  it("names a range's fit for what it is: a split (two-piece) law, not a fitted lognormal", () => {
    render(<DistributionEditor id="ecs" label="ECS" unit="K" value={{ type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" }} onChange={() => {}} />);
    const shape = screen.getByLabelText("Fitted as");
    expect(within(shape).getAllByRole("option").map((o) => o.textContent)).toEqual(["split (two-piece) lognormal", "split (two-piece) normal"]);
    // Two halves with their own spreads meeting at the median (the two-piece form reviewed by
    // Wallis 2014, Statistical Science 29(1)); the seeded ECS range uses the lognormal one.
    expect(screen.getByRole("option", { name: "split (two-piece) lognormal" })).toHaveProperty("selected", true);
  });
});
