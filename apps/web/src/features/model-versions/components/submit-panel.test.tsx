import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { SubmitPanel } from "./submit-panel";

afterEach(() => vi.unstubAllGlobals());

const refusal = {
  error: {
    code: "materiality_threshold_exceeded",
    message: '"Core" v3 cannot be filed as a minor change.',
    details: [
      { path: "changeClass", message: "median shift +0.14 K > 0.1 K on Harbourline Middle 2050", data: { metric: "median-shift" } },
      { path: "changeClass", message: "P(>1.5 K) change +6.2 pts > 5 pts on Harbourline Low 2030", data: { metric: "exceedance" } },
    ],
  },
};

describe("SubmitPanel", () => {
  it("shows which thresholds refused a minor filing, and files it once re-classed as major", async () => {
    const server = stubFetch((req) => {
      if (req.method !== "POST") return undefined;
      return (req.body as { changeClass: string }).changeClass === "minor" ? { status: 409, body: refusal } : { body: { id: "mv-3" } };
    });
    renderWithClient(<SubmitPanel versionId="mv-3" />);
    fireEvent.click(screen.getByRole("radio", { name: /Minor/ }));
    expect(screen.getByText(/first previewed against its parent on every pinned pathway/)).toBeInTheDocument();
    fireEvent.click(screen.getByRole("button", { name: "Submit for review" }));
    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("Not a minor change under the firm's materiality policy");
    expect(alert).toHaveTextContent("fired: median shift +0.14 K > 0.1 K on Harbourline Middle 2050");
    expect(alert).toHaveTextContent("fired: P(>1.5 K) change +6.2 pts > 5 pts on Harbourline Low 2030");
    fireEvent.click(screen.getByRole("button", { name: "Class as major" }));
    expect(screen.getByRole("radio", { name: /Major/ })).toBeChecked();
    expect(screen.queryByRole("alert")).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Submit for review" }));
    await waitFor(() => expect(server.calls.filter((c) => c.method === "POST")).toHaveLength(2));
    expect(server.calls.filter((c) => c.method === "POST")[1]).toMatchObject({ path: "/api/model-versions/mv-3/submit", body: { changeClass: "major" } });
  });
});
