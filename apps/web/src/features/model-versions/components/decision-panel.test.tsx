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
