import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { MaterialityForm } from "./materiality-form";

afterEach(() => vi.unstubAllGlobals());

const defaults = { policy: { medianShiftK: 0.1, exceedancePoints: 5, widthChangePercent: 10 }, customised: false, updatedAt: null, updatedByName: null };

describe("MaterialityForm", () => {
  it("starts from the policy in force, refuses a blank reason beside its field, and saves the thresholds with the reason", async () => {
    const server = stubFetch((req) =>
      req.method === "PUT" ? { body: { policy: { medianShiftK: 0.2, exceedancePoints: 5, widthChangePercent: 10 }, customised: true, updatedAt: "2026-01-02T09:30:00.000Z", updatedByName: "Theo Admin" } } : undefined,
    );
    renderWithClient(<MaterialityForm settings={defaults} />);
    expect(screen.getByLabelText("Median shift (K)")).toHaveValue("0.1");
    expect(screen.getByText(/No admin has set the policy yet/)).toBeInTheDocument();
    fireEvent.change(screen.getByLabelText("Median shift (K)"), { target: { value: "0" } });
    fireEvent.click(screen.getByRole("button", { name: "Save thresholds" }));
    expect(await screen.findByText("must be more than 0 K")).toBeInTheDocument();
    expect(screen.getByText("must be at least 3 characters")).toBeInTheDocument();
    expect(server.calls).toHaveLength(0);
    fireEvent.change(screen.getByLabelText("Median shift (K)"), { target: { value: "0.2" } });
    fireEvent.change(screen.getByLabelText("Reason for the change"), { target: { value: "Board review" } });
    fireEvent.click(screen.getByRole("button", { name: "Save thresholds" }));
    await waitFor(() => expect(server.calls).toHaveLength(1));
    expect(server.calls[0]).toMatchObject({ method: "PUT", path: "/api/settings/materiality", body: { medianShiftK: 0.2, exceedancePoints: 5, widthChangePercent: 10, reason: "Board review" } });
    expect(await screen.findByRole("status")).toHaveTextContent("Saved");
    expect(screen.getByLabelText("Reason for the change")).toHaveValue("");
  });
});
