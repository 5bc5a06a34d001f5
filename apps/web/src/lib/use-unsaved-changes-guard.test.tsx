import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { createMemoryRouter, Link, RouterProvider, useNavigate } from "react-router-dom";
import { afterEach, describe, expect, it, vi } from "vitest";
import { LeaveConfirmDialog } from "@/components/ui/leave-confirm-dialog";
import { useUnsavedChangesGuard } from "./use-unsaved-changes-guard";

/** A one-field form with the guard, as the editors use it: a save lets its own navigation through. */
function GuardedForm({ onDiscard }: { onDiscard: () => void }) {
  const [text, setText] = useState("");
  const guard = useUnsavedChangesGuard(text !== "");
  const navigate = useNavigate();
  return (
    <>
      <input aria-label="Name" value={text} onChange={(e) => setText(e.target.value)} />
      <Link to="/elsewhere">Elsewhere</Link>
      <button
        onClick={() => {
          guard.allowNextNavigation();
          void navigate("/saved");
        }}
      >
        Save
      </button>
      <LeaveConfirmDialog blocker={guard.blocker} onDiscard={onDiscard} />
    </>
  );
}

function renderForm(onDiscard = vi.fn()) {
  const router = createMemoryRouter(
    [
      { path: "/form", element: <GuardedForm onDiscard={onDiscard} /> },
      { path: "*", element: <p>Left the page</p> },
    ],
    { initialEntries: ["/form"] },
  );
  render(<RouterProvider router={router} />);
  return router;
}

afterEach(() => vi.restoreAllMocks());

describe("useUnsavedChangesGuard", () => {
  it("lets a form without changes go without asking", async () => {
    const router = renderForm();
    await userEvent.click(screen.getByRole("link", { name: "Elsewhere" }));
    expect(screen.getByText("Left the page")).toBeInTheDocument();
    expect(router.state.location.pathname).toBe("/elsewhere");
  });

  it("holds a navigation away from unsaved changes until the person chooses, and stays on 'Keep editing'", async () => {
    const router = renderForm();
    await userEvent.type(screen.getByRole("textbox", { name: "Name" }), "Harbour");
    await userEvent.click(screen.getByRole("link", { name: "Elsewhere" }));
    const dialog = screen.getByRole("alertdialog", { name: "Leave without saving?" });
    expect(router.state.location.pathname).toBe("/form");
    expect(screen.getByRole("button", { name: "Keep editing" })).toHaveFocus();
    await userEvent.click(screen.getByRole("button", { name: "Keep editing" }));
    expect(dialog).not.toBeInTheDocument();
    expect(screen.getByRole("textbox", { name: "Name" })).toHaveValue("Harbour");
    expect(router.state.location.pathname).toBe("/form");
  });

  it("goes on when the person leaves, and discards first when asked to", async () => {
    const onDiscard = vi.fn();
    const router = renderForm(onDiscard);
    await userEvent.type(screen.getByRole("textbox", { name: "Name" }), "Harbour");
    await userEvent.click(screen.getByRole("link", { name: "Elsewhere" }));
    await userEvent.click(screen.getByRole("button", { name: "Discard changes and leave" }));
    expect(onDiscard).toHaveBeenCalledTimes(1);
    expect(screen.getByText("Left the page")).toBeInTheDocument();
    expect(router.state.location.pathname).toBe("/elsewhere");
  });

  it("treats Escape as 'Keep editing'", async () => {
    const router = renderForm();
    await userEvent.type(screen.getByRole("textbox", { name: "Name" }), "Harbour");
    await userEvent.click(screen.getByRole("link", { name: "Elsewhere" }));
    await userEvent.keyboard("{Escape}");
    expect(screen.queryByRole("alertdialog")).toBeNull();
    expect(router.state.location.pathname).toBe("/form");
  });

  it("lets the navigation that follows a save through without asking", async () => {
    const router = renderForm();
    await userEvent.type(screen.getByRole("textbox", { name: "Name" }), "Harbour");
    await userEvent.click(screen.getByRole("button", { name: "Save" }));
    expect(screen.queryByRole("alertdialog")).toBeNull();
    expect(router.state.location.pathname).toBe("/saved");
  });

  it("asks the browser to confirm closing or reloading the tab only while there are unsaved changes", async () => {
    renderForm();
    const unload = () => {
      const e = new Event("beforeunload", { cancelable: true });
      window.dispatchEvent(e);
      return e.defaultPrevented;
    };
    expect(unload()).toBe(false);
    await userEvent.type(screen.getByRole("textbox", { name: "Name" }), "H");
    expect(unload()).toBe(true);
    await userEvent.clear(screen.getByRole("textbox", { name: "Name" }));
    expect(unload()).toBe(false);
  });
});
