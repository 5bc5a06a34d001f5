import { useState } from "react";
import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { perilProfilePickerSource } from "../api/get-peril-profiles";
import { perilProfileRecord } from "../testing/records";
import { PerilRunPicker, type PerilRunChoice } from "./peril-run-picker";

const profiles = [
  perilProfileRecord({
    id: "flood",
    name: "Flood, Northmere",
    peril: "flood-heavy-rainfall",
    region: "Northmere Coast",
    metric: "severity",
  }),
  perilProfileRecord({ id: "heat", name: "Heat, Vellan", peril: "heat", region: "Vellan Basin", metric: "frequency" }),
];
const portfolios = [{ id: "pf", name: "Demo baseline", rowCount: 5 }];

function Harness({ onChoice }: { onChoice: (c: PerilRunChoice) => void }) {
  const [value, setValue] = useState<PerilRunChoice>({ perilProfileIds: [], portfolioId: null });
  return (
    <PerilRunPicker
      profileSource={perilProfilePickerSource}
      portfolios={portfolios}
      value={value}
      onChange={(c) => {
        setValue(c);
        onChoice(c);
      }}
    />
  );
}

afterEach(() => vi.unstubAllGlobals());

describe("PerilRunPicker", () => {
  it("opens the portfolio choice once a profile is chosen and clears it when none is left", async () => {
    // GET /api/peril-profiles as the API answers it: `q` in name, peril or region.
    stubFetch((req) => {
      if (req.path !== "/api/peril-profiles") return undefined;
      const q = (req.search.get("q") ?? "").toLowerCase();
      const items = profiles.filter((p) => [p.name, p.peril, p.region].some((t) => t.toLowerCase().includes(q)));
      return { body: { items, total: items.length } };
    });
    let last: PerilRunChoice = { perilProfileIds: [], portfolioId: null };
    renderWithClient(<Harness onChoice={(c) => (last = c)} />);
    expect(screen.getByLabelText("Portfolio baseline")).toBeDisabled();
    const box = screen.getByRole("combobox", { name: "Peril profiles" });
    await userEvent.type(box, "vellan");
    await userEvent.click(await screen.findByRole("option", { name: /Heat, Vellan/ }));
    await userEvent.clear(box);
    await userEvent.type(box, "flood");
    await userEvent.click(await screen.findByRole("option", { name: /Flood, Northmere/ }));
    await userEvent.selectOptions(screen.getByLabelText("Portfolio baseline"), "pf");
    expect(last).toEqual({ perilProfileIds: ["heat", "flood"], portfolioId: "pf" });
    await userEvent.click(screen.getByRole("button", { name: "Remove Heat, Vellan" }));
    await userEvent.click(screen.getByRole("button", { name: "Remove Flood, Northmere" }));
    expect(last).toEqual({ perilProfileIds: [], portfolioId: null });
  });
});
