import { useState } from "react";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { PerilRunPicker, type PerilRunChoice } from "./peril-run-picker";

const profiles = [
  { id: "flood", name: "Flood, Northmere", peril: "flood-heavy-rainfall", region: "Northmere Coast", metric: "severity" as const },
  { id: "heat", name: "Heat, Vellan", peril: "heat", region: "Vellan Basin", metric: "frequency" as const },
];
const portfolios = [{ id: "pf", name: "Demo baseline", rowCount: 5 }];

function Harness({ onChoice }: { onChoice: (c: PerilRunChoice) => void }) {
  const [value, setValue] = useState<PerilRunChoice>({ perilProfileIds: [], portfolioId: null });
  return <PerilRunPicker profiles={profiles} portfolios={portfolios} value={value} onChange={(c) => {
        setValue(c);
        onChoice(c);
      }} />;
}

describe("PerilRunPicker", () => {
  it("opens the portfolio choice once a profile is ticked and clears it when none is left", async () => {
    let last: PerilRunChoice = { perilProfileIds: [], portfolioId: null };
    render(<Harness onChoice={(c) => (last = c)} />);
    expect(screen.getByLabelText("Portfolio baseline")).toBeDisabled();
    await userEvent.click(screen.getByRole("checkbox", { name: /Heat, Vellan/ }));
    await userEvent.click(screen.getByRole("checkbox", { name: /Flood, Northmere/ }));
    await userEvent.selectOptions(screen.getByLabelText("Portfolio baseline"), "pf");
    expect(last).toEqual({ perilProfileIds: ["heat", "flood"], portfolioId: "pf" });
    await userEvent.click(screen.getByRole("checkbox", { name: /Heat, Vellan/ }));
    await userEvent.click(screen.getByRole("checkbox", { name: /Flood, Northmere/ }));
    expect(last).toEqual({ perilProfileIds: [], portfolioId: null });
  });
});
