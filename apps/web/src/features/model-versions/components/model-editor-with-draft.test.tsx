import { fireEvent, render, screen } from "@testing-library/react";
import { createMemoryRouter, RouterProvider } from "react-router-dom";
import { afterEach, describe, expect, it, vi } from "vitest";
import { draftStorageKey } from "@/lib/draft-storage";
import { modelVersion } from "@/testing/api-fixtures";
import { loadedForm } from "../lib/model-draft-storage";
import { ModelEditorWithDraft } from "./model-editor-with-draft";

const v = modelVersion();
const initial = { name: v.name, notes: v.notes, parentId: v.parentId, model: v.model, defaults: v.defaults, perilProfileIds: [] };
const key = draftStorageKey("model-version", "u-analyst", v.id);

function renderEditor(onSave = vi.fn()) {
  const router = createMemoryRouter(
    [
      {
        path: "/edit",
        element: (
          <ModelEditorWithDraft draftKey={key} initial={initial} submitLabel="Save" pending={false} serverError={null} onSave={onSave} />
        ),
      },
      { path: "*", element: <p>Left the page</p> },
    ],
    { initialEntries: ["/edit"] },
  );
  return { router, ...render(<RouterProvider router={router} />) };
}

afterEach(() => localStorage.clear());

// A whole editor redraws on every keystroke: on a busy shared machine a test can pass 5 s of wall time.
describe("ModelEditorWithDraft", { timeout: 20_000 }, () => {
  it("restores a kept draft, distributions included, and discarding returns to the saved version", () => {
    const kept = loadedForm(initial);
    kept.notes = "Wider ECS tail, per the reviewer's note.";
    kept.climate.ecs = { type: "range", p50: 3, low: 2, high: 5.5, coverage: 90, shape: "lognormal" };
    localStorage.setItem(key, JSON.stringify({ savedAt: "2026-12-05T14:03:00.000Z", value: kept }));
    renderEditor();
    expect(screen.getByText("Restored unsaved draft from 2026-12-05 14:03 UTC.")).toBeInTheDocument();
    expect(screen.getByRole("textbox", { name: /^Notes/ })).toHaveValue("Wider ECS tail, per the reviewer's note.");
    expect(screen.getByLabelText("High end", { selector: "#ecs-high" })).toHaveValue("5.5");

    fireEvent.click(screen.getByRole("button", { name: "Discard it" }));
    expect(screen.getByRole("textbox", { name: /^Notes/ })).toHaveValue(v.notes);
    expect(screen.getByLabelText("High end", { selector: "#ecs-high" })).not.toHaveValue("5.5");
    expect(localStorage.getItem(key)).toBeNull();
  });

  it("keeps typed work while it differs from the saved version, and forgets it once typed back", () => {
    renderEditor();
    const name = screen.getByRole("textbox", { name: "Name" });
    fireEvent.change(name, { target: { value: "Harbourline Core, wider tail" } });
    expect((JSON.parse(localStorage.getItem(key) ?? "null") as { value: { name: string } }).value.name).toBe(
      "Harbourline Core, wider tail",
    );
    fireEvent.change(name, { target: { value: v.name } });
    expect(localStorage.getItem(key)).toBeNull();
  });

  it("clears the kept draft on a successful save and leaves without asking", async () => {
    const onSave = vi.fn((_body: unknown, saved: () => void) => saved());
    const { router } = renderEditor(onSave);
    fireEvent.change(screen.getByRole("textbox", { name: "Name" }), { target: { value: "Renamed" } });
    fireEvent.click(screen.getByRole("button", { name: "Save" }));
    expect(onSave).toHaveBeenCalledTimes(1);
    expect(localStorage.getItem(key)).toBeNull();
    await router.navigate("/version");
    expect(screen.queryByRole("alertdialog")).toBeNull();
    expect(router.state.location.pathname).toBe("/version");
  });

  it("drops a kept draft with an input the API would refuse, and says so", () => {
    const kept = loadedForm(initial) as unknown as { climate: Record<string, unknown> };
    kept.climate.ecs = { type: "normal", mean: 3, sd: -1 };
    localStorage.setItem(key, JSON.stringify({ savedAt: "2026-12-05T14:03:00.000Z", value: kept }));
    renderEditor();
    expect(screen.getByText(/could not be restored: it no longer fits this form \(climate\.ecs/)).toBeInTheDocument();
    expect(screen.getByRole("textbox", { name: "Name" })).toHaveValue(v.name);
    expect(localStorage.getItem(key)).toBeNull();
  });
});
