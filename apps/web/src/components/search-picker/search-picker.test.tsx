import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { api } from "@/lib/api-client";
import { stubFetch, type StubRequest } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import type { PickerPage, PickerSource } from "./picker-source";
import { SearchMultiPicker } from "./search-multi-picker";
import { SearchPicker } from "./search-picker";

interface Site {
  id: string;
  name: string;
  retired: boolean;
}

/** 250 items, more than the API's largest page (200), newest first as the lists answer. */
const SITES: Site[] = Array.from({ length: 250 }, (_, i) => {
  const n = String(250 - i).padStart(3, "0");
  return { id: `site-${n}`, name: `Harbour site ${n}`, retired: n === "007" };
});

/**
 * A fake list endpoint that behaves as the API's lists do: `q` matched case-insensitively in the
 * name, `limit` from 1 to 200 (default 50), `offset`, and `{ items, total }`.
 */
function listServer(req: StubRequest) {
  if (req.method !== "GET" || req.path !== "/api/sites") return undefined;
  const q = (req.search.get("q") ?? "").toLowerCase();
  const limit = Number(req.search.get("limit") ?? 50);
  const offset = Number(req.search.get("offset") ?? 0);
  if (limit > 200) return { status: 400, body: { error: { code: "validation_failed", message: "limit must be at most 200" } } };
  const matching = SITES.filter((s) => s.name.toLowerCase().includes(q));
  return { body: { items: matching.slice(offset, offset + limit), total: matching.length } };
}

const siteSource: PickerSource<Site> = {
  queryKey: ["sites"],
  fetchMatches: (query, signal) => api.get<PickerPage<Site>>("/api/sites", { query, signal }),
};

function OnePicker({ onChange, selected }: { onChange?: (id: string) => void; selected?: Site }) {
  const [value, setValue] = useState(selected?.id ?? "");
  return (
    <>
      <SearchPicker
        label="Site"
        source={siteSource}
        itemLabel={(s) => s.name}
        itemDetail={(s) => (s.retired ? "retired" : "in use")}
        isDisabled={(s) => s.retired}
        value={value}
        selected={selected}
        onChange={(id) => {
          setValue(id);
          onChange?.(id);
        }}
      />
      <output aria-label="Chosen id">{value}</output>
    </>
  );
}

const box = () => screen.getByRole("combobox", { name: "Site" });
const searches = (calls: StubRequest[]) => calls.filter((c) => c.path === "/api/sites").map((c) => c.search.get("q") ?? "");

afterEach(() => vi.unstubAllGlobals());

describe("SearchPicker", () => {
  it("asks the server with what is typed, once typing pauses, and says how many more match", async () => {
    const server = stubFetch(listServer);
    const user = userEvent.setup();
    renderWithClient(<OnePicker />);
    await user.click(box());
    // Opening without typing lists the newest 20 of 250 and says the rest can be reached by typing.
    expect(await screen.findByRole("option", { name: /Harbour site 250/ })).toBeInTheDocument();
    expect(screen.getAllByRole("option")).toHaveLength(20);
    expect(screen.getByText("230 more match — keep typing")).toBeInTheDocument();
    await user.type(box(), "site 24");
    expect(await screen.findByRole("option", { name: /Harbour site 249/ })).toBeInTheDocument();
    await waitFor(() => expect(screen.getAllByRole("option")).toHaveLength(10));
    // One request per pause: the half-typed "s", "si", … were never sent.
    expect(new Set(searches(server.calls))).toEqual(new Set(["", "site 24"]));
    expect(server.calls.every((c) => c.search.get("limit") === "20")).toBe(true);
    expect(screen.queryByText(/more match/)).toBeNull();
  });

  it("reaches an item beyond the first 200 by typing part of its name", async () => {
    stubFetch(listServer);
    const onChange = vi.fn();
    const user = userEvent.setup();
    renderWithClient(<OnePicker onChange={onChange} />);
    await user.type(box(), "site 012");
    await user.click(await screen.findByRole("option", { name: /Harbour site 012/ }));
    expect(onChange).toHaveBeenCalledWith("site-012");
    expect(box()).toHaveValue("Harbour site 012");
    expect(box()).toHaveAttribute("aria-expanded", "false");
    expect(screen.queryByRole("listbox")).toBeNull();
  });

  it("is driven by the keyboard: Down/Up move, Enter chooses, Escape closes and puts the choice back", async () => {
    stubFetch(listServer);
    const user = userEvent.setup();
    renderWithClient(<OnePicker />);
    box().focus();
    await user.keyboard("{ArrowDown}");
    expect(box()).toHaveAttribute("aria-expanded", "true");
    await screen.findByRole("option", { name: /Harbour site 250/ });
    await user.keyboard("{ArrowDown}{ArrowDown}{ArrowUp}");
    const active = () => document.getElementById(box().getAttribute("aria-activedescendant") ?? "");
    expect(active()).toHaveTextContent("Harbour site 249");
    await user.keyboard("{Enter}");
    expect(screen.getByRole("status", { name: "Chosen id" })).toHaveTextContent("site-249");
    expect(box()).toHaveValue("Harbour site 249");
    // Up from the top wraps to the last match.
    await user.keyboard("{ArrowDown}");
    await screen.findByRole("listbox");
    await user.keyboard("{ArrowUp}");
    expect(active()).toHaveTextContent("Harbour site 231");
    await user.keyboard("{Escape}");
    expect(screen.queryByRole("listbox")).toBeNull();
    expect(box()).toHaveValue("Harbour site 249");
    expect(screen.getByRole("status", { name: "Chosen id" })).toHaveTextContent("site-249");
  });

  it("keeps the chosen label in sight during a search that does not list it, and back in the box after", async () => {
    stubFetch(listServer);
    const user = userEvent.setup();
    renderWithClient(<OnePicker />);
    await user.type(box(), "site 240");
    await user.click(await screen.findByRole("option", { name: /Harbour site 240/ }));
    await user.clear(box());
    await user.type(box(), "site 11");
    await screen.findByRole("option", { name: /Harbour site 119/ });
    expect(screen.queryByRole("option", { name: /Harbour site 240/ })).toBeNull();
    expect(screen.getByText("Harbour site 240")).toBeInTheDocument();
    expect(screen.getByText(/^Chosen:/)).toHaveTextContent("Chosen: Harbour site 240");
    await user.tab();
    expect(box()).toHaveValue("Harbour site 240");
    expect(screen.getByRole("status", { name: "Chosen id" })).toHaveTextContent("site-240");
  });

  it("shows a choice made elsewhere by its label without it being among the matches", () => {
    stubFetch(listServer);
    renderWithClient(<OnePicker selected={SITES[245]} />);
    expect(box()).toHaveValue("Harbour site 005");
  });

  it("lists a disabled item but does not let it be chosen", async () => {
    stubFetch(listServer);
    const onChange = vi.fn();
    const user = userEvent.setup();
    renderWithClient(<OnePicker onChange={onChange} />);
    await user.type(box(), "site 007");
    const retired = await screen.findByRole("option", { name: /Harbour site 007/ });
    expect(retired).toHaveAttribute("aria-disabled", "true");
    await user.click(retired);
    await user.keyboard("{ArrowDown}{Enter}");
    expect(onChange).not.toHaveBeenCalled();
  });

  it("says what went wrong when the search fails", async () => {
    stubFetch(() => ({ status: 500, body: { error: { code: "internal", message: "The list is unavailable" } } }));
    const user = userEvent.setup();
    renderWithClient(<OnePicker />);
    await user.click(box());
    expect(await screen.findByRole("alert")).toHaveTextContent("Could not search: The list is unavailable");
  });
});

function ManyPicker({ initial = [], known = [] }: { initial?: string[]; known?: Site[] }) {
  const [value, setValue] = useState<string[]>(initial);
  return (
    <>
      <SearchMultiPicker label="Sites" source={siteSource} itemLabel={(s) => s.name} value={value} known={known} onChange={setValue} />
      <output aria-label="Chosen ids">{value.join(",")}</output>
    </>
  );
}

describe("SearchMultiPicker", () => {
  it("adds matches from any page, lists them under the box, and removes them", async () => {
    stubFetch(listServer);
    const user = userEvent.setup();
    renderWithClient(<ManyPicker known={[SITES[0]!]} initial={["site-250"]} />);
    const many = screen.getByRole("combobox", { name: "Sites" });
    await user.type(many, "site 003");
    await user.click(await screen.findByRole("option", { name: /Harbour site 003/ }));
    // The list stays open for more picks; the chosen option is marked.
    expect(screen.getByRole("option", { name: /Harbour site 003/ })).toHaveAttribute("aria-selected", "true");
    await user.clear(many);
    await user.type(many, "site 201");
    await user.click(await screen.findByRole("option", { name: /Harbour site 201/ }));
    const chosen = screen.getByRole("list", { name: "Chosen: Sites" });
    expect(
      within(chosen)
        .getAllByRole("listitem")
        .map((li) => li.textContent),
    ).toEqual(["Harbour site 250Remove", "Harbour site 003Remove", "Harbour site 201Remove"]);
    await user.click(screen.getByRole("button", { name: "Remove Harbour site 003" }));
    expect(screen.getByRole("status", { name: "Chosen ids" })).toHaveTextContent("site-250,site-201");
    // Choosing a chosen item again takes it off.
    await user.type(many, "site 201");
    await user.click(await screen.findByRole("option", { name: /Harbour site 201/, selected: true }));
    expect(screen.getByRole("status", { name: "Chosen ids" })).toHaveTextContent(/^site-250$/);
  });

  it("keeps an id it cannot name, visible and removable", async () => {
    stubFetch(listServer);
    const user = userEvent.setup();
    renderWithClient(<ManyPicker initial={["gone-1"]} />);
    expect(within(screen.getByRole("list", { name: "Chosen: Sites" })).getByText("gone-1")).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Remove gone-1" }));
    expect(screen.getByRole("status", { name: "Chosen ids" })).toBeEmptyDOMElement();
  });
});
