import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { PickerPage, PickerSource } from "@/components/search-picker/picker-source";
import { api } from "@/lib/api-client";
import { stubFetch, type StubRequest } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { RunForm, type PathwayOption, type VersionOption } from "./run-form";

afterEach(() => vi.unstubAllGlobals());

const versions: VersionOption[] = [
  { id: "mv-3", name: "Core", versionNumber: 3, status: "retired" },
  { id: "mv-2", name: "Core", versionNumber: 2, status: "draft" },
  { id: "mv-1", name: "Core", versionNumber: 1, status: "approved" },
];
const pathways: PathwayOption[] = [{ id: "p1", name: "Middle road", startYear: 1750, endYear: 2100, vintage: "2025.1" }];

/** The two list endpoints the pickers ask, answering by `q` in the name as the API does. */
function lists(req: StubRequest) {
  if (req.method !== "GET") return undefined;
  const rows = req.path === "/api/model-versions" ? versions : req.path === "/api/pathways" ? pathways : undefined;
  if (!rows) return undefined;
  const q = (req.search.get("q") ?? "").toLowerCase();
  const items = rows.filter((r) => r.name.toLowerCase().includes(q));
  return { body: { items, total: items.length } };
}

const source = <T extends { id: string }>(path: string): PickerSource<T> => ({
  queryKey: [path],
  fetchMatches: (query, signal) => api.get<PickerPage<T>>(path, { query, signal }),
});
const props = { versionSource: source<VersionOption>("/api/model-versions"), pathwaySource: source<PathwayOption>("/api/pathways") };

describe("RunForm", () => {
  it("puts each validation message beside its field and sends nothing", async () => {
    const server = stubFetch(() => undefined);
    renderWithClient(<RunForm {...props} initialVersion={versions[2]} onCreated={() => {}} />);
    await userEvent.clear(screen.getByLabelText("Members"));
    await userEvent.type(screen.getByLabelText("Members"), "0");
    await userEvent.clear(screen.getByLabelText("Horizons (years)"));
    await userEvent.type(screen.getByLabelText("Horizons (years)"), "2050, soon");
    fireEvent.click(screen.getByRole("button", { name: "Queue run" }));
    // Messages come from the contracts schema the API validates with (createRunBodySchema).
    expect(await screen.findByText("Pathways must hold at least one pathway")).toBeInTheDocument();
    expect(screen.getByLabelText("Members")).toHaveAccessibleDescription("must be at least 1");
    expect(screen.getByLabelText("Horizons (years)")).toHaveAccessibleDescription('"soon" is not a year; list years separated by commas');
    expect(server.calls.filter((c) => c.method === "POST")).toHaveLength(0);
  });

  it("warns that an unapproved version makes the result exploratory, and will not take a retired one", async () => {
    stubFetch(lists);
    renderWithClient(<RunForm {...props} initialVersion={versions[2]} onCreated={() => {}} />);
    const version = screen.getByRole("combobox", { name: "Model version" });
    expect(version).toHaveValue("Core v1");
    expect(screen.queryByText(/will be exploratory/)).toBeNull();
    await userEvent.click(version);
    expect(await screen.findByRole("option", { name: /Core v3/ })).toHaveAttribute("aria-disabled", "true");
    await userEvent.click(screen.getByRole("option", { name: /Core v2/ }));
    expect(version).toHaveValue("Core v2");
    expect(screen.getByText(/will be exploratory/)).toBeInTheDocument();
  });

  it("sends a valid body and shows server field errors where they belong", async () => {
    const server = stubFetch((req) =>
      req.method === "POST"
        ? {
            status: 400,
            body: {
              error: { code: "validation_failed", message: "Bad", details: [{ path: "seed", message: "is already used by another run" }] },
            },
          }
        : lists(req),
    );
    const created = vi.fn();
    renderWithClient(<RunForm {...props} initialVersion={versions[2]} onCreated={created} />);
    await userEvent.type(screen.getByRole("combobox", { name: "Pathways" }), "middle");
    await userEvent.click(await screen.findByRole("option", { name: /Middle road/ }));
    expect(within(screen.getByRole("list", { name: "Chosen: Pathways" })).getByText("Middle road")).toBeInTheDocument();
    await userEvent.clear(screen.getByLabelText("Seed"));
    await userEvent.type(screen.getByLabelText("Seed"), "abc");
    fireEvent.click(screen.getByRole("button", { name: "Queue run" }));
    await waitFor(() => expect(screen.getByLabelText("Seed")).toHaveAccessibleDescription("is already used by another run"));
    expect(server.calls.find((c) => c.method === "POST")!.body).toMatchObject({
      modelVersionId: "mv-1",
      pathwayIds: ["p1"],
      members: 5000,
      seed: "abc",
      sampling: "latin-hypercube",
      horizons: [2030, 2050, 2100],
    });
    expect(created).not.toHaveBeenCalled();
  });
});
