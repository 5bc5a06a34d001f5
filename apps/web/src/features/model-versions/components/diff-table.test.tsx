import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { DiffTable } from "./diff-table";

const notesBefore = ["Illustrative demo assumptions.", "- ECS: median 3 K, 5–95 % 2 to 5 K.", "- F2x: 3.93 W m-2.", "- Forcing scale factors from AR6 Table 7.8."].join("\n");
const addedLine = "- Aerosol–cloud scale widened to 0.1–2.0 (5–95 %).";

describe("DiffTable", () => {
  const diff = {
    against: { id: "mv-1", name: "Core", versionNumber: 1 },
    changes: [
      { path: "model.agents.aerosol-cloud.scale.low", before: 0.298, after: 0.1 },
      { path: "notes", before: notesBefore, after: `${notesBefore}\n${addedLine}` },
    ],
  };

  it("shows a notes change as the one added line, not as two whole texts", () => {
    render(<DiffTable diff={diff} />);
    const notesRow = screen.getByRole("row", { name: /^notes/ });
    const lines = within(notesRow).getAllByRole("listitem");
    const added = lines.filter((li) => li.dataset.change === "added");
    expect(added).toHaveLength(1);
    expect(added[0]).toHaveTextContent(`added: ${addedLine}`);
    expect(lines.filter((li) => li.dataset.change === "removed")).toHaveLength(0);
    expect(notesRow).toHaveTextContent("1 line added, 0 removed");
    // The untouched opening lines are folded away; only the line before the change is shown.
    expect(notesRow).toHaveTextContent("… 3 unchanged lines");
    expect(notesRow).not.toHaveTextContent("Illustrative demo assumptions.");
  });

  it("keeps single values as before and after cells", () => {
    render(<DiffTable diff={diff} />);
    expect(screen.getByRole("row", { name: "model.agents.aerosol-cloud.scale.low 0.298 0.1" })).toBeInTheDocument();
  });
});
