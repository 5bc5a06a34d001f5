import { QueryClientProvider } from "@tanstack/react-query";
import { render, screen } from "@testing-library/react";
import { createMemoryRouter, RouterProvider } from "react-router-dom";
import { afterEach, describe, expect, it, vi } from "vitest";
import { analystMe, managerMe } from "@/testing/api-fixtures";
import { stubFetch } from "@/testing/fetch-stub";
import { testQueryClient } from "@/testing/render-with-client";
import { routes } from "../router";

afterEach(() => vi.unstubAllGlobals());

function renderAt(path: string) {
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  render(
    <QueryClientProvider client={testQueryClient()}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return router;
}

describe("app shell", () => {
  it("explains a forbidden page instead of failing", async () => {
    stubFetch((req) => (req.path === "/api/me" ? { body: analystMe } : undefined));
    renderAt("/model-versions/mv-2/review");
    // The shell gates the page once its lazily loaded module has arrived; that import (the review
    // page pulls in the engine's distribution maths) can take seconds on a busy machine.
    expect(await screen.findByRole("heading", { name: "Approving model versions needs the manager role" }, { timeout: 15_000 })).toBeInTheDocument();
  });

  it("shows only the navigation the role may use", async () => {
    stubFetch((req) => (req.path === "/api/me" ? { body: managerMe } : ["/api/model-versions", "/api/runs", "/api/exports"].includes(req.path) ? { body: { items: [], total: 0 } } : undefined));
    renderAt("/");
    const nav = await screen.findByRole("navigation", { name: "Main" });
    const labels = [...nav.querySelectorAll("a")].map((a) => a.textContent);
    // manager: audit:read gives Admin (audit log); no pathways:write needed to see Pathways (read).
    expect(labels).toEqual(["Desk", "Pathways", "Model versions", "Runs", "Peril lens", "Exports", "Admin"]);
    // A manager may read the audit log but not manage users: Admin opens the audit log.
    expect(nav.querySelector("a:last-child")).toHaveAttribute("href", "/admin/audit");
  });

  it("sends a signed-out visitor to sign-in, remembering the page", async () => {
    stubFetch(() => ({ status: 401, body: { error: { code: "unauthorized", message: "Sign in first" } } }));
    const router = renderAt("/runs");
    expect(await screen.findByRole("heading", { name: "Sign in" })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe("/sign-in");
    expect(router.state.location.search).toBe("?next=%2Fruns");
  });
});

describe("session expiry", () => {
  it("returns to sign-in with a message when a request finds the session gone", async () => {
    let signedIn = true;
    stubFetch((req) => {
      if (req.path === "/api/me") return signedIn ? { body: analystMe } : { status: 401, body: { error: { code: "unauthorized", message: "Sign in first" } } };
      if (req.path === "/api/runs") {
        signedIn = false; // the session expires between requests
        return { status: 401, body: { error: { code: "unauthorized", message: "Sign in first" } } };
      }
      return undefined;
    });
    const router = renderAt("/runs");
    expect(await screen.findByText("Your session has ended. Sign in again to carry on where you were.")).toBeInTheDocument();
    expect(router.state.location.search).toBe("?next=%2Fruns&expired=1");
  });
});
