import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { modelVersion } from "@/testing/api-fixtures";
import { formatDateTime } from "@/lib/format";
import { ReviewWaitNote } from "./review-wait-note";

describe("ReviewWaitNote", () => {
  it("tells the author the version was sent, who decides and how they will hear", () => {
    const v = modelVersion({ status: "in-review", changeClass: "major" });
    render(<ReviewWaitNote version={v} isAuthor />);
    const note = screen.getByRole("status");
    expect(note).toHaveTextContent(`Waiting for review. Submitted on ${formatDateTime(v.submittedAt)} as a major change.`);
    expect(note).toHaveTextContent("A manager other than you approves or rejects it");
    expect(note).toHaveTextContent("you will get the decision by mail");
    expect(note).toHaveTextContent("runs made with it are exploratory");
  });

  it("speaks of the author to other readers", () => {
    render(<ReviewWaitNote version={modelVersion({ status: "in-review" })} isAuthor={false} />);
    expect(screen.getByRole("status")).toHaveTextContent("A manager other than the author approves or rejects it; the managers were told by mail.");
  });

  it("is absent once the version is decided or still a draft", () => {
    const { rerender } = render(<ReviewWaitNote version={modelVersion({ status: "approved" })} isAuthor />);
    expect(screen.queryByRole("status")).toBeNull();
    rerender(<ReviewWaitNote version={modelVersion({ status: "draft" })} isAuthor />);
    expect(screen.queryByRole("status")).toBeNull();
  });
});
