import { screen } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { ApiError } from "@/lib/api-error";
import { renderWithClient } from "@/testing/render-with-client";
import { RunLoadError } from "./run-load-error";

describe("RunLoadError", () => {
  it("offers the way back to the runs list for a run that does not exist, not 'Try again'", () => {
    renderWithClient(<RunLoadError error={new ApiError(404, "not_found", "Run r-gone does not exist.", [])} retry={vi.fn()} />);
    expect(screen.getByRole("heading", { name: "No run here" })).toBeInTheDocument();
    expect(screen.getByText("There is no run at this address")).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Back to runs" })).toHaveAttribute("href", "/runs");
    expect(screen.queryByRole("button", { name: "Try again" })).toBeNull();
  });

  it("keeps the server's reason and a retry for any other failure", () => {
    renderWithClient(<RunLoadError error={new ApiError(500, "internal_error", "An unexpected error occurred.", [])} retry={vi.fn()} />);
    expect(screen.getByRole("alert")).toHaveTextContent("An unexpected error occurred.");
    expect(screen.getByRole("button", { name: "Try again" })).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Back to runs" })).toBeInTheDocument();
  });
});
