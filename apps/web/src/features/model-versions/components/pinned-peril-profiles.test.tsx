import { fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { PinnedPerilProfilesList, PinnedPerilProfilesPicker } from "./pinned-peril-profiles";

const profiles = [
  { id: "pp-rain", name: "Heavy rainfall", peril: "flood-heavy-rainfall", region: "Northmere Coast" },
  { id: "pp-heat", name: "Heat stress", peril: "heat", region: "Eastvale" },
];

describe("pinned peril profiles", () => {
  it("ticks and unticks profiles in the order chosen", () => {
    const onChange = vi.fn();
    const { rerender } = render(<PinnedPerilProfilesPicker profiles={profiles} value={["pp-heat"]} onChange={onChange} />);
    fireEvent.click(screen.getByRole("checkbox", { name: /Heavy rainfall/ }));
    expect(onChange).toHaveBeenLastCalledWith(["pp-heat", "pp-rain"]);
    rerender(<PinnedPerilProfilesPicker profiles={profiles} value={["pp-heat", "pp-rain"]} onChange={onChange} />);
    fireEvent.click(screen.getByRole("checkbox", { name: /Heat stress/ }));
    expect(onChange).toHaveBeenLastCalledWith(["pp-rain"]);
  });

  it("keeps a pinned id that no longer exists visible and removable", () => {
    const onChange = vi.fn();
    render(<PinnedPerilProfilesPicker profiles={profiles} value={["pp-gone"]} onChange={onChange} />);
    expect(screen.getByText("pp-gone")).toBeInTheDocument();
    fireEvent.click(screen.getByRole("checkbox", { name: /pp-gone/ }));
    expect(onChange).toHaveBeenLastCalledWith([]);
  });

  it("lists pins by name on the detail page (id when unknown), or says there are none", () => {
    const { rerender } = render(<PinnedPerilProfilesList ids={["pp-rain", "pp-x"]} profiles={profiles} />);
    expect(screen.getByRole("list", { name: "Pinned peril profiles" })).toHaveTextContent("Heavy rainfall (flood-heavy-rainfall, Northmere Coast)pp-x");
    rerender(<PinnedPerilProfilesList ids={[]} profiles={profiles} />);
    expect(screen.getByText(/No peril profiles pinned/)).toBeInTheDocument();
  });
});
