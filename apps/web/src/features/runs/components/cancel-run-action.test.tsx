import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { runSummary } from "@/testing/api-fixtures";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { CancelRunAction } from "./cancel-run-action";
import { RunProgress } from "./run-progress";

afterEach(() => vi.unstubAllGlobals());

describe("cancelling a run", () => {
  it("asks first, and sends nothing when the person keeps the run", () => {
    const fetch = stubFetch(() => undefined);
    renderWithClient(<CancelRunAction run={runSummary({ status: "running" })} />);
    fireEvent.click(screen.getByRole("button", { name: "Cancel run" }));
    expect(screen.getByRole("group", { name: "Confirm: cancel Three pathways" })).toHaveTextContent("members computed so far are discarded");
    fireEvent.click(screen.getByRole("button", { name: "Keep it running" }));
    expect(screen.getByRole("button", { name: "Cancel run" })).toBeInTheDocument();
    expect(fetch.count("POST", "/api/runs/run-1/cancel")).toBe(0);
  });

  it("reads 'Cancelling…' at once after confirming, and sends one request", async () => {
    const fetch = stubFetch((req) => (req.path === "/api/runs/run-1/cancel" ? { body: runSummary({ status: "running", cancelRequested: true }) } : undefined));
    renderWithClient(<CancelRunAction run={runSummary({ status: "running" })} />);
    fireEvent.click(screen.getByRole("button", { name: "Cancel run" }));
    fireEvent.click(screen.getByRole("button", { name: "Yes, cancel the run" }));
    expect(screen.getByRole("button", { name: "Cancelling…" })).toBeDisabled();
    await waitFor(() => expect(fetch.count("POST", "/api/runs/run-1/cancel")).toBe(1));
  });

  it("keeps reading 'Cancelling…' while the worker has not confirmed (after a reload too)", () => {
    stubFetch(() => undefined);
    renderWithClient(<CancelRunAction run={runSummary({ status: "running", cancelRequested: true })} />);
    expect(screen.getByRole("button", { name: "Cancelling…" })).toBeDisabled();
  });

  it("shows the state 'cancelling…' in the progress cell until the run ends", () => {
    renderWithClient(<RunProgress run={runSummary({ status: "running", progress: 0.4, cancelRequested: true })} />);
    expect(screen.getByText("cancelling…")).toBeInTheDocument();
    expect(screen.queryByText(/left/)).toBeNull();
  });
});
