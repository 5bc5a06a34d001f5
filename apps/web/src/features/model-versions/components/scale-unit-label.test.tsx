import { render, screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { modelVersion } from "@/testing/api-fixtures";
import { AssumptionsTable } from "./assumptions-table";
import { ModelEditor } from "./model-editor";

const base = modelVersion();
const model = { ...base.model, agents: { "aerosol-cloud": { scale: { type: "range" as const, p50: 1, low: 0.3, high: 1.7, coverage: 90 as const, shape: "lognormal" as const } } } };

describe("scale factor unit", () => {
  it("reads (×) in the editor heading and in the assumptions table alike", () => {
    const initial = { name: base.name, notes: base.notes, parentId: base.parentId, model, defaults: base.defaults, perilProfileIds: [] };
    const { unmount } = render(<ModelEditor initial={initial} submitLabel="Save" pending={false} serverError={null} onSave={vi.fn()} />);
    const group = screen.getByRole("group", { name: /Aerosol–cloud scale/ });
    expect(group).toHaveTextContent("Aerosol–cloud scale (×)");
    expect(group).not.toHaveTextContent("(× (scale))");
    unmount();

    render(<AssumptionsTable model={model} />);
    const row = screen.getByRole("row", { name: /Aerosol–cloud scale/ });
    expect(within(row).getAllByRole("cell")[0]).toHaveTextContent(/^Aerosol–cloud scale \(×\)$/);
  });
});
