import { fireEvent, screen, waitFor } from "@testing-library/react";
import type { Replay } from "@plumeline/contracts";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { ReplayPanel } from "./replay-panel";

afterEach(() => vi.unstubAllGlobals());

const replay = (over: Partial<Replay> = {}): Replay => ({
  id: "rp-1",
  runId: "run-1",
  status: "running",
  progress: 0.35,
  matched: null,
  resultHash: "abc",
  replayHash: null,
  engineVersion: null,
  error: null,
  requestedBy: "u-analyst",
  createdAt: "2026-01-01T00:00:00.000Z",
  finishedAt: null,
  ...over,
});

describe("ReplayPanel", () => {
  it("shows a running replay's progress like a run's, and no second replay can be asked for meanwhile", async () => {
    stubFetch((req) => (req.path === "/api/runs/run-1/replays" ? { body: [replay()] } : undefined));
    renderWithClient(<ReplayPanel runId="run-1" canReplay />);
    expect(await screen.findByRole("progressbar", { name: "Progress of the replay" })).toHaveAttribute("aria-valuenow", "35");
    expect(screen.getByRole("button", { name: "Replaying…" })).toBeDisabled();
  });

  it("queues a replay, then shows the verdict once it finished", async () => {
    let replays: Replay[] = [];
    const fetch = stubFetch((req) => {
      if (req.method === "POST" && req.path === "/api/runs/run-1/replay") {
        replays = [replay({ status: "succeeded", progress: 1, matched: true, replayHash: "abc", engineVersion: "0.3.0" })];
        return { status: 202, body: replay({ status: "queued", progress: 0 }) };
      }
      if (req.path === "/api/runs/run-1/replays") return { body: replays };
      return undefined;
    });
    renderWithClient(<ReplayPanel runId="run-1" canReplay />);
    fireEvent.click(await screen.findByRole("button", { name: "Replay and compare" }));
    await waitFor(() => expect(screen.getByRole("status")).toHaveTextContent("Identical: the replay reproduced the stored result."));
    expect(fetch.count("POST", "/api/runs/run-1/replay")).toBe(1);
  });
});
