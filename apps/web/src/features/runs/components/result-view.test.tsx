import { fireEvent, render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { runFixture, runResultFixture } from "@/testing/result-fixture";
import { ResultView } from "./result-view";

describe("ResultView fan chart", () => {
  it("draws the other pathway as its median only, and as outlined bands once asked", () => {
    const { container } = render(<ResultView run={runFixture()} result={runResultFixture()} />);
    const fan = () => container.querySelector("figure svg[role='img']")!;
    expect(fan().querySelectorAll('[data-treatment="filled"]')).toHaveLength(1);
    expect(fan().querySelectorAll('[data-treatment="median"]')).toHaveLength(1);
    expect(fan().querySelectorAll('[data-treatment="outline"]')).toHaveLength(0);
    fireEvent.click(screen.getByRole("checkbox", { name: "Show the other pathways' bands" }));
    expect(fan().querySelectorAll('[data-treatment="outline"]')).toHaveLength(1);
    expect(fan().querySelectorAll('[data-treatment="median"]')).toHaveLength(0);
    expect(screen.getByText(/Outlined: the other pathways/)).toBeInTheDocument();
  });
});
