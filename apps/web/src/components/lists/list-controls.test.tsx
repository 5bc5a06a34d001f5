import { act, fireEvent, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ApiError } from "@/lib/api-error";
import { ListControls } from "./list-controls";
import { listErrorTitle, listFieldErrors } from "./list-field-errors";
import { ListPager } from "./list-pager";
import type { ListQueryChange, ListQueryState } from "./use-list-query";
import { TYPING_PAUSE_MS } from "./debounced-input";

type F = "status" | "author" | "from" | "to" | "mine";
const initial: ListQueryState<F> = {
  q: "",
  sort: "createdAt:desc",
  limit: 50,
  offset: 0,
  filters: { status: "", author: "", from: "", to: "", mine: "" },
};

/** The controls over a plain state holder, recording every change they report. */
function Harness({ changes, errors }: { changes: Array<ListQueryChange<F>>; errors?: Record<string, string> }) {
  const [state, setState] = useState(initial);
  return (
    <ListControls<F>
      noun="runs"
      state={state}
      onChange={(c) => {
        changes.push(c);
        setState((s) => ({
          ...s,
          ...(c.q !== undefined ? { q: c.q } : {}),
          ...(c.sort ? { sort: c.sort } : {}),
          filters: { ...s.filters, ...c.filters },
        }));
      }}
      sortOptions={[
        { value: "createdAt:desc", label: "Newest first" },
        { value: "name:asc", label: "Name A–Z" },
      ]}
      selects={[{ key: "status", label: "Status", options: [{ value: "failed", label: "failed" }] }]}
      texts={[{ key: "author", label: "Started by" }]}
      toggles={[{ key: "mine", label: "Only mine" }]}
      dates
      {...(errors ? { errors } : {})}
    />
  );
}

afterEach(() => vi.useRealTimers());

describe("ListControls", () => {
  it("sends the search once the typing pauses, not on every key", () => {
    vi.useFakeTimers();
    const changes: Array<ListQueryChange<F>> = [];
    render(<Harness changes={changes} />);
    const box = screen.getByRole("searchbox", { name: "Search runs" });
    for (const text of ["c", "co", "coastal"]) fireEvent.change(box, { target: { value: text } });
    act(() => {
      vi.advanceTimersByTime(TYPING_PAUSE_MS - 1);
    });
    expect(changes).toEqual([]);
    act(() => {
      vi.advanceTimersByTime(1);
    });
    expect(changes).toEqual([{ q: "coastal" }]);
  });

  it("reports sort, select, date and toggle changes at once, and clears them", async () => {
    const changes: Array<ListQueryChange<F>> = [];
    render(<Harness changes={changes} />);
    const user = userEvent.setup();
    await user.selectOptions(screen.getByRole("combobox", { name: "Sort" }), "name:asc");
    await user.selectOptions(screen.getByRole("combobox", { name: "Status" }), "failed");
    fireEvent.change(screen.getByLabelText("Created from"), { target: { value: "2026-01-31" } });
    await user.click(screen.getByRole("checkbox", { name: "Only mine" }));
    expect(changes).toEqual([
      { sort: "name:asc" },
      { filters: { status: "failed" } },
      { filters: { from: "2026-01-31" } },
      { filters: { mine: "true" } },
    ]);
    await user.click(screen.getByRole("button", { name: "Clear filters" }));
    expect(changes.at(-1)).toEqual({ q: "", filters: { status: "", author: "", from: "", to: "" } });
  });

  it("shows a refused date beside its field, naming the field", () => {
    const error = new ApiError(400, "validation_failed", "The request has invalid fields.", [
      { path: "from", message: "must be an ISO date (YYYY-MM-DD) or date-time" },
    ]);
    render(<Harness changes={[]} errors={listFieldErrors(error)} />);
    const search = screen.getByRole("search", { name: "Search and filter runs" });
    expect(within(search).getByRole("alert")).toHaveTextContent("from: must be an ISO date (YYYY-MM-DD) or date-time");
    expect(screen.getByLabelText("Created from")).toHaveAttribute("aria-invalid", "true");
    expect(listErrorTitle(error)).toBe("These filters could not be used");
    // Anything but a 400 is not a filter problem.
    expect(listFieldErrors(new ApiError(500, "internal_error", "boom"))).toEqual({});
    expect(listErrorTitle(new ApiError(500, "internal_error", "boom"))).toBeUndefined();
  });
});

describe("ListPager", () => {
  it("says which rows are shown of how many and moves a page at a time", async () => {
    const moves: number[] = [];
    const { rerender } = render(<ListPager noun="runs" total={1234} offset={50} limit={50} shown={50} onOffset={(o) => moves.push(o)} />);
    expect(screen.getByRole("navigation", { name: "Pages of runs" })).toHaveTextContent("51–100 of 1,234 runs· page 2 of 25");
    await userEvent.click(screen.getByRole("button", { name: "Previous" }));
    await userEvent.click(screen.getByRole("button", { name: "Next" }));
    expect(moves).toEqual([0, 100]);
    rerender(<ListPager noun="runs" total={1234} offset={1200} limit={50} shown={34} onOffset={(o) => moves.push(o)} />);
    expect(screen.getByRole("navigation")).toHaveTextContent("1,201–1,234 of 1,234 runs");
    expect(screen.getByRole("button", { name: "Next" })).toBeDisabled();
  });
});
