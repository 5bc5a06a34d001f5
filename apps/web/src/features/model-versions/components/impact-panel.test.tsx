import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { impactFixture } from "../testing/impact-fixture";
import { ImpactPanel } from "./impact-panel";

afterEach(() => vi.unstubAllGlobals());

describe("ImpactPanel", () => {
  it("on the review page starts at once: loading state, then the side-by-side tables", async () => {
    let answer: (value: Response) => void = () => {};
    vi.stubGlobal("fetch", vi.fn(() => new Promise<Response>((resolve) => (answer = resolve))));
    renderWithClient(<ImpactPanel versionId="mv-3" parentId="mv-2" autoStart />);
    expect(screen.getByRole("status")).toHaveTextContent("this takes a few seconds");
    answer(new Response(JSON.stringify(impactFixture()), { status: 200, headers: { "Content-Type": "application/json" } }));
    expect(await screen.findByRole("table", { name: "Warming at the horizons on Harbourline Middle" })).toBeInTheDocument();
  });

  it("elsewhere waits for a click before spending server time", async () => {
    const server = stubFetch(() => ({ body: impactFixture() }));
    renderWithClient(<ImpactPanel versionId="mv-3" parentId="mv-2" autoStart={false} />);
    expect(server.calls).toHaveLength(0);
    fireEvent.click(screen.getByRole("button", { name: "Preview the effect against the parent" }));
    expect(await screen.findByRole("table", { name: "Exceedance probabilities on Harbourline Low" })).toBeInTheDocument();
    expect(server.calls).toHaveLength(1);
  });

  it("previews every pinned pathway by default and a picked subset only when asked", async () => {
    const server = stubFetch(() => ({ body: impactFixture() }));
    const pinned = [
      { id: "pw-middle", name: "Harbourline Middle" },
      { id: "pw-low", name: "Harbourline Low" },
    ];
    renderWithClient(<ImpactPanel versionId="mv-3" parentId="mv-2" autoStart pathways={pinned} />);
    await screen.findByRole("table", { name: "Warming at the horizons on Harbourline Low" });
    // All pinned: the server's default, so no list is sent (and the cache entry is shared with the submission check).
    expect(server.calls[0]).toMatchObject({ body: {} });
    const apply = screen.getByRole("button", { name: "Preview on these" });
    expect(apply).toBeDisabled();
    fireEvent.click(screen.getByRole("checkbox", { name: "Harbourline Middle" }));
    expect(server.calls).toHaveLength(1); // ticking alone spends no server time
    fireEvent.click(apply);
    await waitFor(() => expect(server.calls).toHaveLength(2));
    expect(server.calls[1]).toMatchObject({ body: { pathwayIds: ["pw-low"] } });
    // Unticking the last one leaves nothing to preview: the button stays off and says why.
    fireEvent.click(screen.getByRole("checkbox", { name: "Harbourline Low" }));
    expect(screen.getByText("Pick at least one pathway.")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Preview on these" })).toBeDisabled();
  });

  it("shows the server's reason when the preview fails, and says so when there is no parent", async () => {
    stubFetch(() => ({ status: 409, body: { error: { code: "impact_failed", message: "The preview ensemble did not finish: horizon 2300 is after the pathway ends." } } }));
    const { unmount } = renderWithClient(<ImpactPanel versionId="mv-3" parentId="mv-2" autoStart />);
    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("The preview could not be made");
    expect(alert).toHaveTextContent("horizon 2300 is after the pathway ends");
    unmount();
    renderWithClient(<ImpactPanel versionId="mv-1" parentId={null} autoStart />);
    expect(screen.getByText(/no parent/)).toBeInTheDocument();
  });
});
