import { fireEvent, render, screen } from "@testing-library/react";
import { MemoryRouter } from "react-router-dom";
import { describe, expect, it } from "vitest";
import { ExportPanel } from "./export-panel";

/** jsdom does not download: a click on a link only fires its handler, which is what is checked. */
const noNavigation = (e: MouseEvent) => e.preventDefault();

describe("ExportPanel", () => {
  it("says nothing until a file is asked for, then names it and points to the Exports record", () => {
    render(<ExportPanel runId="run-1" exploratory={false} canWorkbook hasPerils={false} />, { wrapper: MemoryRouter });
    expect(screen.queryByRole("status")).toBeNull();
    const csv = screen.getByRole("link", { name: "horizons.csv" });
    csv.addEventListener("click", noNavigation);
    fireEvent.click(csv);
    expect(screen.getByRole("status")).toHaveTextContent("horizons.csv requested: your browser saves it. Every download is recorded with its checksum on Exports.");
    expect(screen.getByRole("link", { name: "Exports" })).toHaveAttribute("href", "/exports");
    const workbook = screen.getByRole("link", { name: "Workbook (.xlsx)" });
    workbook.addEventListener("click", noNavigation);
    fireEvent.click(workbook);
    expect(screen.getByRole("status")).toHaveTextContent(/^Workbook \(\.xlsx\) requested/);
  });

  it("offers the member table as a CSV and states how large a run the workbook holds it for", () => {
    render(<ExportPanel runId="run 1" exploratory={false} canWorkbook hasPerils={false} />, { wrapper: MemoryRouter });
    expect(screen.getByRole("link", { name: "members.csv" }).getAttribute("href")).toMatch(/\/api\/runs\/run%201\/tables\/members\.csv$/);
    expect(screen.getByText(/Members sheet up to 10,000 members/)).toBeInTheDocument();
  });

  it("offers the peril tables only when the run applied the peril lens", () => {
    render(<ExportPanel runId="run-1" exploratory={false} canWorkbook hasPerils={false} />, { wrapper: MemoryRouter });
    expect(screen.queryByRole("link", { name: /^peril-/ })).toBeNull();
  });
});
