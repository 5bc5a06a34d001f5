import { fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { modelVersion } from "@/testing/api-fixtures";
import { ModelEditor } from "./model-editor";

const v = modelVersion();
const constraint = { from: 2011, to: 2020, observed: 1.09, sd: 0.076 };
const editorFor = (c: Record<string, number>) => ({
  name: v.name,
  notes: v.notes,
  parentId: v.parentId,
  model: { ...v.model, constraint: c as typeof constraint & { internalVariability: number } },
  defaults: v.defaults,
});

describe("ModelEditor observational constraint", () => {
  it("saves a version's own internal variability back unchanged (editing must not reset it to the default)", () => {
    const onSave = vi.fn();
    render(<ModelEditor initial={editorFor({ ...constraint, internalVariability: 0.1 })} submitLabel="Save" pending={false} serverError={null} onSave={onSave} />);
    expect(screen.getByLabelText("Internal variability sd (K)")).toHaveValue("0.1");
    fireEvent.click(screen.getByRole("button", { name: "Save" }));
    expect(onSave.mock.calls[0]![0].model.constraint).toEqual({ ...constraint, internalVariability: 0.1 });
  });

  it("shows the 0.21 K default (AR6 WGI SPM A.1.3, −0.2 to +0.2 °C read as 17–83 %) for a version saved without the field, and saves what is typed", () => {
    const onSave = vi.fn();
    render(<ModelEditor initial={editorFor(constraint)} submitLabel="Save" pending={false} serverError={null} onSave={onSave} />);
    const field = screen.getByLabelText("Internal variability sd (K)");
    expect(field).toHaveValue("0.21");
    fireEvent.change(field, { target: { value: "0" } });
    fireEvent.click(screen.getByRole("button", { name: "Save" }));
    expect(onSave.mock.calls[0]![0].model.constraint.internalVariability).toBe(0);
  });
});
