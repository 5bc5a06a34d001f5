import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import type { Blocker } from "react-router-dom";
import { describe, expect, it, vi } from "vitest";
import { LeaveConfirmDialog } from "./leave-confirm-dialog";

/**
 * A page with a button that opens the dialog, as a held navigation does. The blocker is a plain
 * object of the router's shape whose reset closes the dialog, so the dialog itself runs unchanged.
 */
function PageWithDialog({ proceed = vi.fn() }: { proceed?: () => void }) {
  const [blocked, setBlocked] = useState(false);
  const blocker: Blocker = blocked
    ? {
        state: "blocked",
        location: { pathname: "/elsewhere", search: "", hash: "", state: null, key: "k" },
        reset: () => setBlocked(false),
        proceed,
      }
    : { state: "unblocked", location: undefined, reset: undefined, proceed: undefined };
  return (
    <>
      <input aria-label="Name" />
      <button onClick={() => setBlocked(true)}>Go elsewhere</button>
      <button>After</button>
      <LeaveConfirmDialog blocker={blocker} onDiscard={vi.fn()} />
    </>
  );
}

describe("LeaveConfirmDialog as a modal", () => {
  it("moves focus in on open and keeps Tab and Shift+Tab cycling inside", async () => {
    const user = userEvent.setup();
    render(<PageWithDialog />);
    await user.click(screen.getByRole("button", { name: "Go elsewhere" }));
    const keep = screen.getByRole("button", { name: "Keep editing" });
    const leave = screen.getByRole("button", { name: "Leave, keep the draft" });
    const discard = screen.getByRole("button", { name: "Discard changes and leave" });
    expect(keep).toHaveFocus();
    await user.tab();
    expect(leave).toHaveFocus();
    await user.tab();
    expect(discard).toHaveFocus();
    await user.tab();
    expect(keep).toHaveFocus();
    await user.tab({ shift: true });
    expect(discard).toHaveFocus();
    // The page behind cannot be reached while the dialog is open.
    expect(screen.getByRole("textbox", { name: "Name", hidden: true }).closest("[inert]")).not.toBeNull();
  });

  it("returns focus to where it was when the person stays (button or Escape), and frees the page", async () => {
    const user = userEvent.setup();
    render(<PageWithDialog />);
    const opener = screen.getByRole("button", { name: "Go elsewhere" });
    await user.click(opener);
    await user.click(screen.getByRole("button", { name: "Keep editing" }));
    expect(screen.queryByRole("alertdialog")).toBeNull();
    expect(opener).toHaveFocus();
    expect(document.querySelector("[inert]")).toBeNull();

    await user.click(opener);
    expect(screen.getByRole("alertdialog", { name: "Leave without saving?" })).toBeInTheDocument();
    await user.keyboard("{Escape}");
    expect(screen.queryByRole("alertdialog")).toBeNull();
    expect(opener).toHaveFocus();
  });
});
