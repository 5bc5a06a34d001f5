import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { User } from "@plumeline/contracts";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { useUsers } from "../api/get-users";
import { UsersTable } from "./users-table";

// Requests and answers follow docs/API.md: GET /api/users, POST /api/users/:id/deactivate|reactivate
// returning the User, and the one error shape { error: { code, message } }.

afterEach(() => vi.unstubAllGlobals());

const people = (): User[] => [
  { id: "u-admin", email: "admin@example.test", name: "Avery Quinlan", role: "admin", createdAt: "2025-01-02T00:00:00.000Z", deactivated: false },
  { id: "u-act", email: "actuary@example.test", name: "Tomas Whitcombe", role: "actuary", createdAt: "2025-01-03T00:00:00.000Z", deactivated: false },
  { id: "u-old", email: "former@example.test", name: "Rhea Palliser", role: "analyst", createdAt: "2025-01-04T00:00:00.000Z", deactivated: true },
];

/** A little users API: status changes are kept, so the refetched list shows them. */
function usersApi(refuse?: { status: number; code: string; message: string }) {
  const users = people();
  const stub = stubFetch((req) => {
    if (req.method === "GET" && req.path === "/api/users") return { body: users };
    const m = /^\/api\/users\/([^/]+)\/(deactivate|reactivate)$/.exec(req.path);
    if (req.method !== "POST" || !m) return undefined;
    if (refuse) return { status: refuse.status, body: { error: { code: refuse.code, message: refuse.message } } };
    const user = users.find((u) => u.id === m[1])!;
    user.deactivated = m[2] === "deactivate";
    return { body: user };
  });
  return stub;
}

function Harness() {
  const users = useUsers();
  return users.data ? <UsersTable users={users.data} currentUserId="u-admin" /> : null;
}

const rowOf = async (name: string) => (await screen.findByRole("cell", { name })).closest("tr")!;

describe("UsersTable status", () => {
  it("shows each person's status in words and keeps the admin's own deactivation disabled", async () => {
    usersApi();
    renderWithClient(<Harness />);
    expect(within(await rowOf("Tomas Whitcombe")).getByText("Active")).toBeInTheDocument();
    expect(within(await rowOf("Rhea Palliser")).getByText("Deactivated")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Reactivate Rhea Palliser" })).toBeEnabled();
    expect(screen.getByRole("button", { name: "Deactivate Avery Quinlan" })).toBeDisabled();
  });

  it("asks before deactivating: Cancel sends nothing, confirming posts and the row reads Deactivated", async () => {
    const api = usersApi();
    renderWithClient(<Harness />);
    await userEvent.click(await screen.findByRole("button", { name: "Deactivate Tomas Whitcombe" }));
    const confirm = screen.getByRole("group", { name: "Confirm: deactivate Tomas Whitcombe" });
    expect(confirm).toHaveTextContent("signed out at once");
    await userEvent.click(within(confirm).getByRole("button", { name: "Cancel" }));
    expect(api.count("POST", "/api/users/u-act/deactivate")).toBe(0);

    await userEvent.click(screen.getByRole("button", { name: "Deactivate Tomas Whitcombe" }));
    await userEvent.click(screen.getByRole("button", { name: "Yes, deactivate" }));
    await waitFor(() => expect(within(screen.getByRole("cell", { name: "Tomas Whitcombe" }).closest("tr")!).getByText("Deactivated")).toBeInTheDocument());
    expect(api.count("POST", "/api/users/u-act/deactivate")).toBe(1);
    expect(screen.getByRole("button", { name: "Reactivate Tomas Whitcombe" })).toBeInTheDocument();
  });

  it("reactivates after confirmation", async () => {
    const api = usersApi();
    renderWithClient(<Harness />);
    await userEvent.click(await screen.findByRole("button", { name: "Reactivate Rhea Palliser" }));
    await userEvent.click(screen.getByRole("button", { name: "Yes, reactivate" }));
    await waitFor(() => expect(within(screen.getByRole("cell", { name: "Rhea Palliser" }).closest("tr")!).getByText("Active")).toBeInTheDocument());
    expect(api.count("POST", "/api/users/u-old/reactivate")).toBe(1);
  });

  it("shows the server's sentence when it refuses", async () => {
    usersApi({ status: 403, code: "self_deactivation", message: "An admin cannot deactivate their own account; ask another admin." });
    renderWithClient(<Harness />);
    await userEvent.click(await screen.findByRole("button", { name: "Deactivate Tomas Whitcombe" }));
    await userEvent.click(screen.getByRole("button", { name: "Yes, deactivate" }));
    expect(await screen.findByRole("alert")).toHaveTextContent("An admin cannot deactivate their own account; ask another admin.");
  });
});
