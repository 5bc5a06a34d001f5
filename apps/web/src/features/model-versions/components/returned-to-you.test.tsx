import { screen } from "@testing-library/react";
import type { ModelVersionSummary } from "@plumeline/contracts";
import { afterEach, describe, expect, it, vi } from "vitest";
import { modelVersion } from "@/testing/api-fixtures";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { ReturnedToYou } from "./returned-to-you";

afterEach(() => vi.unstubAllGlobals());

const rejected: ModelVersionSummary = {
  id: "mv-9",
  name: "Core",
  versionNumber: 4,
  status: "rejected",
  parentId: "mv-3",
  changeClass: "minor",
  authorId: "u-analyst",
  authorName: "Ines Calloway",
  createdAt: "2026-01-01T00:00:00.000Z",
  updatedAt: "2026-01-02T00:00:00.000Z",
  submittedAt: "2026-01-01T12:00:00.000Z",
  decidedBy: "u-manager",
  decidedByName: "Marit Osei",
  decidedAt: "2026-01-02T09:30:00.000Z",
};

describe("ReturnedToYou", () => {
  it("shows the reviewer's reason from the version itself, who decided, and links to the version and a correction", async () => {
    const full = modelVersion({ ...rejected, decisionComment: "The 2050 shift is not minor; file it as major." });
    stubFetch((req) => (req.path === "/api/model-versions/mv-9" ? { body: full } : undefined));
    renderWithClient(<ReturnedToYou versions={[rejected]} />);
    expect(screen.getByRole("heading", { name: "Returned to you" })).toBeInTheDocument();
    expect(await screen.findByText("The 2050 shift is not minor; file it as major.")).toBeInTheDocument();
    expect(screen.getByText(/Rejected by Marit Osei/)).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Core v4" })).toHaveAttribute("href", "/model-versions/mv-9");
    expect(screen.getByRole("link", { name: "Draft a correction" })).toHaveAttribute("href", "/model-versions/new?from=mv-9");
  });

  it("renders nothing when nothing was returned", () => {
    const { container } = renderWithClient(<ReturnedToYou versions={[]} />);
    expect(container).toBeEmptyDOMElement();
  });
});
