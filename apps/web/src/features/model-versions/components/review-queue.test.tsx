import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { modelVersion } from "@/testing/api-fixtures";
import { renderWithClient } from "@/testing/render-with-client";
import { ReviewQueue } from "./review-queue";

describe("ReviewQueue", () => {
  const others = modelVersion({ id: "mv-2", name: "Wider aerosol", authorId: "u-analyst", authorName: "Ines" });
  const own = modelVersion({ id: "mv-3", name: "Extra horizon", authorId: "u-manager", authorName: "Marit" });

  it("lists only others' versions as hers to decide and her own apart, marked for another manager", () => {
    renderWithClient(<ReviewQueue versions={[others, own]} userId="u-manager" />);
    const toDecide = screen.getByRole("list", { name: "Versions for you to decide" });
    expect(within(toDecide).getAllByRole("listitem")).toHaveLength(1);
    expect(toDecide).toHaveTextContent("Wider aerosol");
    expect(within(toDecide).getByRole("link", { name: "Review" })).toHaveAttribute("href", "/model-versions/mv-2/review");

    const ownSection = screen.getByRole("region", { name: "Your own versions in review" });
    expect(ownSection).toHaveTextContent("Extra horizon");
    expect(ownSection).toHaveTextContent("another manager decides");
    expect(within(ownSection).queryByRole("link", { name: "Review" })).toBeNull();
  });

  it("says there is nothing to review when only her own version waits", () => {
    renderWithClient(<ReviewQueue versions={[own]} userId="u-manager" />);
    expect(screen.getByText(/^Nothing for you to decide: only your own version waits/)).toBeInTheDocument();
    expect(screen.queryByRole("list", { name: "Versions for you to decide" })).toBeNull();
    expect(screen.getByRole("region", { name: "Your own versions in review" })).toBeInTheDocument();
  });

  it("says in one line that nothing waits when the queue is empty", () => {
    renderWithClient(<ReviewQueue versions={[]} userId="u-manager" />);
    expect(screen.getByText("Nothing to review.")).toBeInTheDocument();
    expect(screen.queryByRole("region", { name: "Your own versions in review" })).toBeNull();
  });
});
