import { fireEvent, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { PickerPage, PickerSource } from "@/components/search-picker/picker-source";
import { api } from "@/lib/api-client";
import { modelVersion } from "@/testing/api-fixtures";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { ModelEditor } from "./model-editor";
import type { PinnableProfile } from "./pinned-peril-profiles";

const v = modelVersion();
const initial = { name: v.name, notes: v.notes, parentId: v.parentId, model: v.model, defaults: v.defaults, perilProfileIds: ["pp-heat"] };
const profiles = [
  { id: "pp-rain", name: "Heavy rainfall", peril: "flood-heavy-rainfall", region: "Northmere Coast" },
  { id: "pp-heat", name: "Heat stress", peril: "heat", region: "Eastvale" },
];
const source: PickerSource<PinnableProfile> = {
  queryKey: ["profiles"],
  fetchMatches: (query, signal) => api.get<PickerPage<PinnableProfile>>("/api/peril-profiles", { query, signal }),
};

afterEach(() => vi.unstubAllGlobals());

describe("ModelEditor pinned peril profiles", () => {
  it("starts from the pinned ids and saves the chosen profiles as perilProfileIds", async () => {
    // GET /api/peril-profiles as the API answers it: `q` in the name, `{ items, total }`.
    stubFetch((req) => {
      if (req.path !== "/api/peril-profiles") return undefined;
      const items = profiles.filter((p) => p.name.toLowerCase().includes((req.search.get("q") ?? "").toLowerCase()));
      return { body: { items, total: items.length } };
    });
    const onSave = vi.fn();
    renderWithClient(
      <ModelEditor
        initial={initial}
        submitLabel="Save"
        pending={false}
        serverError={null}
        onSave={onSave}
        perilProfiles={{ source, known: [profiles[1]!] }}
      />,
    );
    expect(screen.getByRole("list", { name: "Chosen: Pinned peril profiles" })).toHaveTextContent("Heat stress");
    await userEvent.type(screen.getByRole("combobox", { name: "Pinned peril profiles" }), "rain");
    await userEvent.click(await screen.findByRole("option", { name: "Heavy rainfall" }));
    fireEvent.click(screen.getByRole("button", { name: "Save" }));
    expect(onSave).toHaveBeenCalledTimes(1);
    expect(onSave.mock.calls[0]![0].perilProfileIds).toEqual(["pp-heat", "pp-rain"]);
  });

  it("keeps the pins when there is no picker to show them (nothing silently unpinned)", () => {
    const onSave = vi.fn();
    render(<ModelEditor initial={initial} submitLabel="Save" pending={false} serverError={null} onSave={onSave} />);
    expect(screen.queryByRole("combobox", { name: "Pinned peril profiles" })).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Save" }));
    expect(onSave.mock.calls[0]![0].perilProfileIds).toEqual(["pp-heat"]);
  });
});
