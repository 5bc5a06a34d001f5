import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { PickerPage, PickerSource } from "@/components/search-picker/picker-source";
import { api } from "@/lib/api-client";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { PinnedPerilProfilesList, PinnedPerilProfilesPicker, type PinnableProfile } from "./pinned-peril-profiles";

const profiles = [
  { id: "pp-rain", name: "Heavy rainfall", peril: "flood-heavy-rainfall", region: "Northmere Coast" },
  { id: "pp-heat", name: "Heat stress", peril: "heat", region: "Eastvale" },
];

/** GET /api/peril-profiles as the API answers it: `q` in name, peril or region, `{ items, total }`. */
const answerProfiles = () =>
  stubFetch((req) => {
    if (req.path !== "/api/peril-profiles") return undefined;
    const q = (req.search.get("q") ?? "").toLowerCase();
    const items = profiles.filter((p) => [p.name, p.peril, p.region].some((t) => t.toLowerCase().includes(q)));
    return { body: { items, total: items.length } };
  });

const source: PickerSource<PinnableProfile> = {
  queryKey: ["profiles"],
  fetchMatches: (query, signal) => api.get<PickerPage<PinnableProfile>>("/api/peril-profiles", { query, signal }),
};

function Harness({ initial, known, onChange }: { initial: string[]; known: PinnableProfile[]; onChange: (ids: string[]) => void }) {
  const [value, setValue] = useState(initial);
  return (
    <PinnedPerilProfilesPicker
      source={source}
      known={known}
      value={value}
      onChange={(ids) => {
        setValue(ids);
        onChange(ids);
      }}
    />
  );
}

afterEach(() => vi.unstubAllGlobals());

describe("pinned peril profiles", () => {
  it("names the pins it starts with, adds a searched profile after them, and removes one", async () => {
    answerProfiles();
    const onChange = vi.fn();
    renderWithClient(<Harness initial={["pp-heat"]} known={[profiles[1]!]} onChange={onChange} />);
    expect(screen.getByRole("list", { name: "Chosen: Pinned peril profiles" })).toHaveTextContent("Heat stress");
    await userEvent.type(screen.getByRole("combobox", { name: "Pinned peril profiles" }), "northmere");
    await userEvent.click(await screen.findByRole("option", { name: "Heavy rainfall" }));
    expect(onChange).toHaveBeenLastCalledWith(["pp-heat", "pp-rain"]);
    await userEvent.click(screen.getByRole("button", { name: "Remove Heat stress" }));
    expect(onChange).toHaveBeenLastCalledWith(["pp-rain"]);
  });

  it("keeps a pinned id that no longer exists visible and removable", async () => {
    answerProfiles();
    const onChange = vi.fn();
    renderWithClient(<Harness initial={["pp-gone"]} known={profiles} onChange={onChange} />);
    expect(screen.getByText("pp-gone")).toBeInTheDocument();
    await userEvent.click(screen.getByRole("button", { name: "Remove pp-gone" }));
    expect(onChange).toHaveBeenLastCalledWith([]);
  });

  it("lists pins by name on the detail page (id when unknown), or says there are none", () => {
    const { rerender } = render(<PinnedPerilProfilesList ids={["pp-rain", "pp-x"]} profiles={profiles} />);
    expect(screen.getByRole("list", { name: "Pinned peril profiles" })).toHaveTextContent(
      "Heavy rainfall (flood-heavy-rainfall, Northmere Coast)pp-x",
    );
    rerender(<PinnedPerilProfilesList ids={[]} profiles={profiles} />);
    expect(screen.getByText(/No peril profiles pinned/)).toBeInTheDocument();
  });
});
