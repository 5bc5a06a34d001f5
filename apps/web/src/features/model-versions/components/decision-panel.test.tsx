import { fireEvent, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { modelVersion } from "@/testing/api-fixtures";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { DecisionPanel } from "./decision-panel";

afterEach(() => vi.unstubAllGlobals());

describe("DecisionPanel", () => {
  it("disables approving one's own version and says why", () => {
    stubFetch(() => undefined);
    renderWithClient(<DecisionPanel version={modelVersion({ authorId: "u-manager" })} currentUserId="u-manager" />);
    expect(screen.getByRole("button", { name: "Approve" })).toBeDisabled();
    expect(screen.getByRole("button", { name: "Reject" })).toBeDisabled();
    expect(screen.getByRole("note")).toHaveTextContent("another manager must approve or reject it");
  });

  it("asks for a comment before deciding, then sends it", async () => {
    const server = stubFetch((req) => (req.method === "POST" ? { body: modelVersion({ status: "rejected" }) } : undefined));
    renderWithClient(<DecisionPanel version={modelVersion()} currentUserId="u-manager" />);
    fireEvent.click(screen.getByRole("button", { name: "Reject" }));
    expect(screen.getByLabelText("Comment")).toHaveAccessibleDescription("Write a comment: it is recorded with the decision");
    expect(server.calls).toHaveLength(0);
    fireEvent.change(screen.getByLabelText("Comment"), { target: { value: "Aerosol range too narrow" } });
    fireEvent.click(screen.getByRole("button", { name: "Reject" }));
    await vi.waitFor(() => expect(server.calls[0]).toMatchObject({ method: "POST", path: "/api/model-versions/mv-2/reject", body: { comment: "Aerosol range too narrow" } }));
  });
});

describe("DecisionPanel after a decision", () => {
  it("says what the approval did and does not offer the approval comment as the reason to retire", async () => {
    const server = stubFetch((req) => (req.method === "POST" ? { body: modelVersion({ status: "approved" }) } : undefined));
    const { rerender } = renderWithClient(<DecisionPanel version={modelVersion()} currentUserId="u-manager" />);
    fireEvent.change(screen.getByLabelText("Comment"), { target: { value: "Ranges match the cited sources" } });
    fireEvent.click(screen.getByRole("button", { name: "Approve" }));
    await vi.waitFor(() => expect(server.calls).toHaveLength(1));
    // The page re-renders the panel with the approved version it now holds.
    rerender(<DecisionPanel version={modelVersion({ status: "approved" })} currentUserId="u-manager" />);
    await vi.waitFor(() => expect(screen.getByRole("status")).toHaveTextContent(/^Approved\. The author was mailed/));
    expect(screen.getByLabelText("Why retire it (optional)")).toHaveValue("");
    expect(screen.getByRole("link", { name: "Back to the desk" })).toHaveAttribute("href", "/");
  });

  it("shows no outcome before anything was decided", () => {
    stubFetch(() => undefined);
    renderWithClient(<DecisionPanel version={modelVersion({ status: "approved" })} currentUserId="u-manager" />);
    expect(screen.queryByRole("status")).toBeNull();
    expect(screen.getByRole("button", { name: "Retire version" })).toBeEnabled();
  });
});
