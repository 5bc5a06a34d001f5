import { useState } from "react";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { emptyDraft, toProfileBody, type ProfileDraft } from "../lib/profile-draft";
import { PerilProfileForm } from "./peril-profile-form";

function Harness({ onDraft, errors }: { onDraft: (d: ProfileDraft) => void; errors?: Record<string, string> }) {
  const [draft, setDraft] = useState(emptyDraft());
  return (
    <PerilProfileForm
      draft={draft}
      errors={errors}
      onChange={(d) => {
        setDraft(d);
        onDraft(d);
      }}
    />
  );
}

describe("PerilProfileForm", () => {
  it("builds a table profile from the points typed in, with a second table for rarer events", async () => {
    let last = emptyDraft();
    render(<Harness onDraft={(d) => (last = d)} />);
    await userEvent.click(screen.getByRole("radio", { name: "Tables by warming level and return period" }));
    await userEvent.click(screen.getByRole("button", { name: "Add point to table 1" }));
    await userEvent.type(screen.getByLabelText("Table 1 point 3 warming"), "4");
    await userEvent.type(screen.getByLabelText("Table 1 point 3 value"), "9.4");
    await userEvent.click(screen.getByRole("button", { name: "Add a table for another return period" }));
    // The new table starts at five times the return period, on the same warming levels.
    expect(screen.getByLabelText("Table 2: events of return period (years)")).toHaveValue("50");
    for (const [i, v] of ["1", "3", "39.2"].entries()) await userEvent.type(screen.getByLabelText(`Table 2 point ${i + 1} value`), v);
    await userEvent.selectOptions(screen.getByLabelText("Beyond the tables' return periods"), "extrapolate");
    expect(toProfileBody(last).body?.scaling).toEqual({
      kind: "table",
      tables: [
        { returnPeriod: 10, points: [{ warming: 1, multiplier: 1 }, { warming: 2, multiplier: 2 }, { warming: 4, multiplier: 9.4 }] },
        { returnPeriod: 50, points: [{ warming: 1, multiplier: 1 }, { warming: 2, multiplier: 3 }, { warming: 4, multiplier: 39.2 }] },
      ],
      beyondTable: "hold",
      beyondReturnPeriods: "extrapolate",
    });
    // Many keystrokes: more time than the default on a shared, busy machine.
  }, 30_000);

  it("shows the server's message beside the field it names", () => {
    render(<Harness onDraft={() => undefined} errors={{ "scaling.rate.low": "lets the rate reach -100 % per K", baselineWarming: "must lie between 0 and 3 K" }} />);
    expect(screen.getByLabelText("Low end of range (% per K)")).toHaveAttribute("aria-invalid", "true");
    expect(screen.getByText("lets the rate reach -100 % per K")).toBeInTheDocument();
    expect(screen.getByText("must lie between 0 and 3 K")).toBeInTheDocument();
  });
});
