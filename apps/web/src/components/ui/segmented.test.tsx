import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { describe, expect, it } from "vitest";
import { Segmented } from "./segmented";

function Years() {
  const [year, setYear] = useState(2050);
  return (
    <>
      <button type="button">before</button>
      <Segmented label="Horizon year" value={year} onChange={setYear} options={[2030, 2050, 2100].map((y) => ({ value: y, label: String(y) }))} />
      <button type="button">after</button>
    </>
  );
}

// Expected keys follow the WAI-ARIA Authoring Practices radio group pattern (w3.org/WAI/ARIA/apg/patterns/radio).
describe("Segmented", () => {
  it("is one Tab stop, on the chosen option", async () => {
    render(<Years />);
    await userEvent.click(screen.getByRole("button", { name: "before" }));
    await userEvent.tab();
    expect(screen.getByRole("radio", { name: "2050" })).toHaveFocus();
    await userEvent.tab();
    expect(screen.getByRole("button", { name: "after" })).toHaveFocus();
  });

  it("moves the choice and focus with the arrow keys, wrapping, and Home/End", async () => {
    render(<Years />);
    screen.getByRole("radio", { name: "2050" }).focus();
    await userEvent.keyboard("{ArrowRight}");
    expect(screen.getByRole("radio", { name: "2100" })).toHaveAttribute("aria-checked", "true");
    expect(screen.getByRole("radio", { name: "2100" })).toHaveFocus();
    await userEvent.keyboard("{ArrowRight}");
    expect(screen.getByRole("radio", { name: "2030" })).toHaveAttribute("aria-checked", "true");
    await userEvent.keyboard("{ArrowLeft}");
    expect(screen.getByRole("radio", { name: "2100" })).toHaveFocus();
    await userEvent.keyboard("{Home}");
    expect(screen.getByRole("radio", { name: "2030" })).toHaveAttribute("aria-checked", "true");
    await userEvent.keyboard("{End}");
    expect(screen.getByRole("radio", { name: "2100" })).toHaveAttribute("aria-checked", "true");
  });
});
