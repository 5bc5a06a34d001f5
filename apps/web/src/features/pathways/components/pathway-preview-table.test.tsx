import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { PathwayPreviewTable } from "./pathway-preview-table";

describe("PathwayPreviewTable", () => {
  it("shows a tiny negative forcing as 0.000, not -0.000, and keeps real negatives", () => {
    render(
      <PathwayPreviewTable
        rows={[
          { year: 1850, volcanic_erf_wm2: -0.0000003 },
          { year: 1851, volcanic_erf_wm2: -0.25 },
          { year: 1852, volcanic_erf_wm2: -0 },
        ]}
      />,
    );
    const table = screen.getByRole("table", { name: "First rows of the file as read by the server" });
    expect(within(table).getAllByRole("cell").map((c) => c.textContent)).toEqual(["1850", "0.000", "1851", "-0.250", "1852", "0.000"]);
  });
});
