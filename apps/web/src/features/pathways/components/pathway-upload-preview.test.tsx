import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { PathwayUploadPreview } from "./pathway-upload-preview";

describe("PathwayUploadPreview", () => {
  it("draws every year of the file (forcing by agent with its total, concentrations apart) above the first rows", async () => {
    // What the server answers for an invented three-year file (apps/api/UPLOADS.md), only its first row in `rows`.
    render(
      <PathwayUploadPreview
        name="Gases"
        preview={{
          startYear: 2000,
          endYear: 2002,
          agents: [
            { agent: "co2", quantity: "ppm", column: "co2_ppm" },
            { agent: "aerosol-cloud", quantity: "erf", column: "aerosol-cloud_erf_wm2" },
            { agent: "ozone", quantity: "erf", column: "ozone_erf_wm2" },
          ],
          rows: [{ year: 2000, co2_ppm: 370, "aerosol-cloud_erf_wm2": -0.8, ozone_erf_wm2: 0.5 }],
          series: { co2: { ppm: [370, 372, 374] }, "aerosol-cloud": { erf: [-0.8, -0.81, -0.82] }, ozone: { erf: [0.5, 0.5, 0.5] } },
        }}
      />,
    );
    const stack = screen.getByRole("figure", { name: "Forcing by agent — Gases" });
    await userEvent.click(within(stack).getByRole("button", { name: "Show table" }));
    // Every year is drawn, not only the first rows, with the total of the ERF agents: 0.5 − 0.8 = −0.3 in 2000.
    const rows = within(stack)
      .getAllByRole("row")
      .slice(1)
      .map((r) =>
        within(r)
          .getAllByRole("cell")
          .map((c) => c.textContent),
      );
    expect(rows).toEqual([
      ["2000", "0.500", "-0.800", "-0.300"],
      ["2002", "0.500", "-0.820", "-0.320"],
    ]);
    expect(screen.getByRole("figure", { name: "Concentrations (ppm)" })).toBeInTheDocument();
    expect(screen.getByRole("table", { name: "First rows of the file as read by the server" })).toBeInTheDocument();
  });
});
