import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { RunStatement } from "@plumeline/contracts";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { RunStatementsPanel } from "./run-statements-panel";

afterEach(() => vi.unstubAllGlobals());

const statement = (over: Partial<RunStatement>): RunStatement => ({
  id: "s1",
  runId: "run-1",
  kind: "reliance",
  text: "Relies on the 2025 catastrophe-model baseline.",
  createdBy: "u-actuary",
  createdByName: "Tobias Wrenfield",
  createdAt: "2026-03-01T10:00:00.000Z",
  ...over,
});

describe("RunStatementsPanel", () => {
  it("lists the recorded statements and records a limitation, then shows it", async () => {
    const stored = [statement({})];
    const server = stubFetch((req) => {
      if (req.path !== "/api/runs/run-1/statements") return undefined;
      if (req.method === "GET") return { body: stored };
      const body = req.body as { kind: "reliance" | "limitation"; text: string };
      const created = statement({ id: "s2", ...body });
      stored.push(created);
      return { status: 201, body: created };
    });
    renderWithClient(<RunStatementsPanel runId="run-1" canRecord />);
    const list = await screen.findByRole("list", { name: "Recorded statements" });
    expect(list).toHaveTextContent("Relies on the 2025 catastrophe-model baseline.");

    await userEvent.click(screen.getByRole("radio", { name: "Limitation" }));
    await userEvent.type(screen.getByLabelText("Limitation statement"), "Not for reserving.");
    await userEvent.click(screen.getByRole("button", { name: "Record statement" }));

    await waitFor(() => expect(within(screen.getByRole("list", { name: "Recorded statements" })).getAllByRole("listitem")).toHaveLength(2));
    expect(server.calls.find((c) => c.method === "POST")!.body).toEqual({ kind: "limitation", text: "Not for reserving." });
    expect(screen.getByLabelText("Limitation statement")).toHaveValue("");
  });

  it("says what is wrong beside the field and sends nothing for an empty statement", async () => {
    const server = stubFetch((req) => (req.method === "GET" ? { body: [] } : undefined));
    renderWithClient(<RunStatementsPanel runId="run-1" canRecord />);
    expect(await screen.findByText("None recorded yet.")).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText("Reliance statement"), "   ");
    await userEvent.click(screen.getByRole("button", { name: "Record statement" }));
    // The message comes from the shared contracts schema (createRunStatementBodySchema).
    expect(await screen.findByText("write the statement")).toBeInTheDocument();
    expect(screen.getByLabelText("Reliance statement")).toHaveAttribute("aria-invalid", "true");
    expect(server.count("POST", "/api/runs/run-1/statements")).toBe(0);
  });

  it("offers no form without the runs:create permission", async () => {
    stubFetch((req) => (req.method === "GET" ? { body: [statement({})] } : undefined));
    renderWithClient(<RunStatementsPanel runId="run-1" canRecord={false} />);
    await screen.findByRole("list", { name: "Recorded statements" });
    expect(screen.queryByRole("button", { name: "Record statement" })).toBeNull();
    expect(screen.getByText(/needs the analyst or actuary role/)).toBeInTheDocument();
  });
});
