import { fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { modelVersion } from "@/testing/api-fixtures";
import { ModelEditor } from "./model-editor";

const v = modelVersion();
const initial = { name: v.name, notes: v.notes, parentId: v.parentId, model: v.model, defaults: v.defaults, perilProfileIds: ["pp-heat"] };
const profiles = [
  { id: "pp-rain", name: "Heavy rainfall", peril: "flood-heavy-rainfall", region: "Northmere Coast" },
  { id: "pp-heat", name: "Heat stress", peril: "heat", region: "Eastvale" },
];

describe("ModelEditor pinned peril profiles", () => {
  it("starts from the pinned ids and saves the ticked profiles as perilProfileIds", () => {
    const onSave = vi.fn();
    render(<ModelEditor initial={initial} submitLabel="Save" pending={false} serverError={null} onSave={onSave} perilProfiles={profiles} />);
    expect(screen.getByRole("checkbox", { name: /Heat stress/ })).toBeChecked();
    fireEvent.click(screen.getByRole("checkbox", { name: /Heavy rainfall/ }));
    fireEvent.click(screen.getByRole("button", { name: "Save" }));
    expect(onSave).toHaveBeenCalledTimes(1);
    expect(onSave.mock.calls[0]![0].perilProfileIds).toEqual(["pp-heat", "pp-rain"]);
  });

  it("keeps the pins when the profile list is not there to show (nothing silently unpinned)", () => {
    const onSave = vi.fn();
    render(<ModelEditor initial={initial} submitLabel="Save" pending={false} serverError={null} onSave={onSave} />);
    expect(screen.queryByRole("group", { name: "Pinned peril profiles" })).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Save" }));
    expect(onSave.mock.calls[0]![0].perilProfileIds).toEqual(["pp-heat"]);
  });
});
