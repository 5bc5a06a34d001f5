import { fireEvent, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { RunForm } from "./run-form";

afterEach(() => vi.unstubAllGlobals());

const versions = [
  { id: "mv-1", name: "Core", versionNumber: 1, status: "approved" as const },
  { id: "mv-2", name: "Core", versionNumber: 2, status: "draft" as const },
];
const pathways = [{ id: "p1", name: "Middle road", startYear: 1750, endYear: 2100, vintage: "2025.1" }];

describe("RunForm", () => {
  it("puts each validation message beside its field and sends nothing", async () => {
    const server = stubFetch(() => undefined);
    renderWithClient(<RunForm versions={versions} pathways={pathways} onCreated={() => {}} />);
    await userEvent.clear(screen.getByLabelText("Members"));
    await userEvent.type(screen.getByLabelText("Members"), "0");
    await userEvent.clear(screen.getByLabelText("Horizons (years)"));
    await userEvent.type(screen.getByLabelText("Horizons (years)"), "2050, soon");
    fireEvent.click(screen.getByRole("button", { name: "Queue run" }));
    // Messages come from the contracts schema the API validates with (createRunBodySchema).
    expect(await screen.findByText("Pathways must hold at least one pathway")).toBeInTheDocument();
    expect(screen.getByLabelText("Members")).toHaveAccessibleDescription("must be at least 1");
    expect(screen.getByLabelText("Horizons (years)")).toHaveAccessibleDescription('"soon" is not a year; list years separated by commas');
    expect(server.calls).toHaveLength(0);
  });

  it("warns that an unapproved version makes the result exploratory", async () => {
    stubFetch(() => undefined);
    renderWithClient(<RunForm versions={versions} pathways={pathways} onCreated={() => {}} />);
    expect(screen.queryByText(/will be exploratory/)).toBeNull();
    await userEvent.selectOptions(screen.getByLabelText("Model version"), "mv-2");
    expect(screen.getByText(/will be exploratory/)).toBeInTheDocument();
  });

  it("sends a valid body and shows server field errors where they belong", async () => {
    const server = stubFetch((req) =>
      req.method === "POST"
        ? { status: 400, body: { error: { code: "validation_failed", message: "Bad", details: [{ path: "seed", message: "is already used by another run" }] } } }
        : undefined,
    );
    const created = vi.fn();
    renderWithClient(<RunForm versions={versions} pathways={pathways} onCreated={created} />);
    await userEvent.click(screen.getByRole("checkbox", { name: /Middle road/ }));
    await userEvent.clear(screen.getByLabelText("Seed"));
    await userEvent.type(screen.getByLabelText("Seed"), "abc");
    fireEvent.click(screen.getByRole("button", { name: "Queue run" }));
    await waitFor(() => expect(screen.getByLabelText("Seed")).toHaveAccessibleDescription("is already used by another run"));
    expect(server.calls[0]!.body).toMatchObject({ modelVersionId: "mv-1", pathwayIds: ["p1"], members: 5000, seed: "abc", sampling: "latin-hypercube", horizons: [2030, 2050, 2100] });
    expect(created).not.toHaveBeenCalled();
  });
});
