import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { Pathway } from "@plumeline/contracts";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { PathwayComposer } from "./pathway-composer";

afterEach(() => vi.unstubAllGlobals());

/** An invented stored pathway, as GET /api/pathways/:id answers it. */
function pathway(id: string, name: string, startYear: number, agents: Pathway["agents"]): Pathway {
  const length = Object.values(agents).map((s) => Object.values(s ?? {})[0]?.length ?? 0)[0] ?? 0;
  return {
    id,
    name,
    description: "",
    source: "invented for a test",
    vintage: "t1",
    startYear,
    endYear: startYear + length - 1,
    agents,
    quantities: {},
    checksum: "0".repeat(64),
    locked: false,
    createdBy: "u1",
    createdAt: "2026-12-01T00:00:00.000Z",
  };
}

// Base 2000–2003: CO2 forcing on the line 1 + 0.5·(year − 2000), ozone flat.
const base = pathway("p-base", "Base ramp", 2000, { co2: { erf: [1, 1.5, 2, 2.5] }, ozone: { erf: [0.25, 0.25, 0.25, 0.25] } });
const longer = pathway("p-long", "Longer one", 1999, { co2: { erf: [0, 1, 1, 1, 1, 1] } });

/** GET /api/pathways as the API answers it: summaries (agent ids, not series) matching `q` by name, `{ items, total }`. */
function pathwayList(search: URLSearchParams) {
  const q = (search.get("q") ?? "").toLowerCase();
  const items = [base, longer].filter((p) => p.name.toLowerCase().includes(q)).map((p) => ({ ...p, agents: Object.keys(p.agents) }));
  return { body: { items, total: items.length } };
}

const step = (n: number) => screen.getByRole("region", { name: new RegExp(`^Step ${n}:`) });
async function addStep(name: string) {
  await userEvent.click(within(screen.getByRole("group", { name: "Add a step" })).getByRole("button", { name }));
}
async function retype(box: HTMLElement, text: string) {
  await userEvent.clear(box);
  await userEvent.type(box, text);
}

describe("PathwayComposer", () => {
  it("scales an agent and extends it by a linear trend, charts each step, and saves the result with its recipe", async () => {
    const fetch = stubFetch((req) =>
      req.method === "POST" && req.path === "/api/pathways"
        ? { status: 201, body: pathway("p-new", "Saved", 2000, { co2: { erf: [1] } }) }
        : undefined,
    );
    const onSaved = vi.fn();
    renderWithClient(<PathwayComposer base={base} onSaved={onSaved} />);

    await addStep("Scale an agent");
    await userEvent.selectOptions(within(step(1)).getByLabelText("Agent"), "co2");
    await retype(within(step(1)).getByLabelText("Factor"), "2");
    expect(within(step(1)).getByText(/Changed: 1 agent; the pathway now covers 2000–2003/)).toBeInTheDocument();
    expect(within(step(1)).getByRole("heading", { name: "Step 1: net forcing" })).toBeInTheDocument();
    expect(within(step(1)).getByRole("heading", { name: "Step 1: CO2 (W m-2)" })).toBeInTheDocument();

    await addStep("Extend beyond the last year");
    await retype(within(step(2)).getByLabelText("Extend to year"), "2005");
    await userEvent.selectOptions(within(step(2)).getByLabelText("How"), "linear");
    await retype(within(step(2)).getByLabelText("Fit the trend over the last N years"), "4");
    expect(within(step(2)).getByText(/Changed: 2 agents; the pathway now covers 2000–2005/)).toBeInTheDocument();
    // Both agents changed (lengthened), each drawn base against after.
    expect(within(step(2)).getByRole("heading", { name: "Step 2: Ozone (W m-2)" })).toBeInTheDocument();

    await retype(screen.getByLabelText("Name"), "Base ramp, doubled CO2");
    await userEvent.click(screen.getByRole("button", { name: "Save as new pathway" }));
    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    const post = fetch.calls.find((c) => c.method === "POST")!;
    // Closed form: CO2 doubled is 2 + (year − 2000), a line the trend continues exactly; ozone held flat.
    expect(post.body).toEqual({
      name: "Base ramp, doubled CO2",
      source: "invented for a test",
      vintage: "t1",
      description:
        'Composed in Plumeline from "Base ramp" (id p-base): 1. CO2 scaled by 2 in 2000–2003. 2. extended to 2005 continuing each agent\'s least-squares line over its last 4 years.',
      startYear: 2000,
      agents: { co2: { erf: [2, 3, 4, 5, 6, 7] }, ozone: { erf: [0.25, 0.25, 0.25, 0.25, 0.25, 0.25] } },
      recipe: {
        basePathwayId: "p-base",
        steps: [
          { kind: "scale", agent: "co2", factor: 2, fromYear: 2000, toYear: 2003 },
          { kind: "extend", toYear: 2005, method: "linear", fitYears: 4 },
        ],
      },
    });
    // Each keystroke re-applies every step and redraws its charts; a busy two-core machine needs the room.
  }, 30_000);

  it("refuses to blend pathways over different years, naming the years, and offers no save", async () => {
    const server = stubFetch((req) =>
      req.method !== "GET"
        ? undefined
        : req.path === "/api/pathways/p-long"
          ? { body: longer }
          : req.path === "/api/pathways"
            ? pathwayList(req.search)
            : undefined,
    );
    renderWithClient(<PathwayComposer base={base} onSaved={() => undefined} />);
    await addStep("Blend with another pathway");
    const blendWith = within(step(1)).getByRole("combobox", { name: "Blend with" });
    await userEvent.type(blendWith, "longer");
    await waitFor(() => expect(server.calls.some((c) => c.path === "/api/pathways" && c.search.get("q") === "longer")).toBe(true));
    await userEvent.click(await within(step(1)).findByRole("option", { name: /Longer one/ }));
    // Its label stays in the box once its numbers are read.
    await waitFor(() => expect(blendWith).toHaveValue("Longer one"));
    const alert = await within(step(1)).findByText(/^Step 1 is not applied:/);
    expect(alert).toHaveTextContent(
      "otherPathwayId covers 1999–2004 but the pathway so far covers 2000–2003: years 1999 and 2004 are only in the other pathway. A blend needs the same years in both",
    );
    expect(screen.getByRole("button", { name: "Save as new pathway" })).toBeDisabled();
  });

  it("shows the server's refusal with each value named by its year", async () => {
    stubFetch((req) =>
      req.method === "POST"
        ? {
            status: 400,
            body: {
              error: {
                code: "validation_failed",
                message: "The request has invalid fields.",
                details: [{ path: "agents.co2.erf[3]", message: "must be finite" }],
              },
            },
          }
        : undefined,
    );
    renderWithClient(<PathwayComposer base={base} onSaved={() => undefined} />);
    await userEvent.click(screen.getByRole("button", { name: "Save as new pathway" }));
    const alert = await screen.findByText("The server did not save the pathway");
    expect(alert.closest("[role=alert]")).toHaveTextContent("agents.co2.erf, year 2003 must be finite");
  });

  it("counts the recipe against the description's 2000 characters and says so, saving nothing", async () => {
    const fetch = stubFetch(() => undefined);
    renderWithClient(<PathwayComposer base={base} onSaved={() => undefined} />);
    await addStep("Scale an agent");
    await userEvent.click(screen.getByLabelText("Description (optional)"));
    await userEvent.paste("x".repeat(1950));
    await userEvent.click(screen.getByRole("button", { name: "Save as new pathway" }));
    const recipeLength = 'Composed in Plumeline from "Base ramp" (id p-base): 1. CO2 scaled by 1 in 2000–2003.'.length;
    expect(
      screen.getByText(
        `must be at most 2000 characters — the recipe alone takes ${recipeLength}; shorten the description or use fewer steps`,
      ),
    ).toBeInTheDocument();
    expect(fetch.count("POST", "/api/pathways")).toBe(0);
  });
});
