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
  it("builds a table profile from the points typed in", async () => {
    let last = emptyDraft();
    render(<Harness onDraft={(d) => (last = d)} />);
    await userEvent.click(screen.getByRole("radio", { name: "Table by warming level" }));
    await userEvent.click(screen.getByRole("button", { name: "Add point" }));
    await userEvent.type(screen.getByLabelText("Point 3 warming"), "4");
    await userEvent.type(screen.getByLabelText("Point 3 value"), "9.4");
    expect(toProfileBody(last).body?.scaling).toEqual({
      kind: "table",
      points: [
        { warming: 1, multiplier: 1 },
        { warming: 2, multiplier: 2 },
        { warming: 4, multiplier: 9.4 },
      ],
      beyondTable: "hold",
    });
  });

  it("shows the server's message beside the field it names", () => {
    render(<Harness onDraft={() => undefined} errors={{ "scaling.rate.low": "lets the rate reach -100 % per K", baselineWarming: "must lie between 0 and 3 K" }} />);
    expect(screen.getByLabelText("Low end of range (% per K)")).toHaveAttribute("aria-invalid", "true");
    expect(screen.getByText("lets the rate reach -100 % per K")).toBeInTheDocument();
    expect(screen.getByText("must lie between 0 and 3 K")).toBeInTheDocument();
  });
});
