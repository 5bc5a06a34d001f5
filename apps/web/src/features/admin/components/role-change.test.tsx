import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { User } from "@plumeline/contracts";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { useUsers } from "../api/get-users";
import { UsersTable } from "./users-table";

// Requests and answers follow docs/API.md: PATCH /api/users/:id { role, reason } returning the
// User, 403 self_role_change, and the one error shape { error: { code, message, details } }.

afterEach(() => vi.unstubAllGlobals());

const people = (): User[] => [
  { id: "u-admin", email: "admin@example.test", name: "Avery Quinlan", role: "admin", createdAt: "2025-01-02T00:00:00.000Z", deactivated: false },
  { id: "u-act", email: "actuary@example.test", name: "Tomas Whitcombe", role: "actuary", createdAt: "2025-01-03T00:00:00.000Z", deactivated: false },
];

/** A little users API: role changes are kept, so the refetched list shows them. */
function usersApi(refuse?: { status: number; code: string; message: string }) {
  const users = people();
  return stubFetch((req) => {
    if (req.method === "GET" && req.path === "/api/users") return { body: users };
    const m = /^\/api\/users\/([^/]+)$/.exec(req.path);
    if (req.method !== "PATCH" || !m) return undefined;
    if (refuse) return { status: refuse.status, body: { error: { code: refuse.code, message: refuse.message } } };
    const user = users.find((u) => u.id === m[1])!;
    user.role = (req.body as { role: User["role"] }).role;
    return { body: user };
  });
}

function Harness() {
  const users = useUsers();
  return users.data ? <UsersTable users={users.data} currentUserId="u-admin" /> : null;
}

describe("UsersTable role change", () => {
  it("does not offer a control for one's own role", async () => {
    usersApi();
    renderWithClient(<Harness />);
    await screen.findByRole("combobox", { name: "Role of Tomas Whitcombe" });
    expect(screen.queryByRole("combobox", { name: "Role of Avery Quinlan" })).toBeNull();
    expect((await screen.findByRole("cell", { name: "Avery Quinlan" })).closest("tr")).toHaveTextContent("admin (you)");
  });

  it("asks for confirmation and a reason: Cancel sends nothing, no reason sends nothing, confirming sends role and reason", async () => {
    const api = usersApi();
    renderWithClient(<Harness />);
    const select = await screen.findByRole("combobox", { name: "Role of Tomas Whitcombe" });
    await userEvent.selectOptions(select, "manager");
    const confirm = screen.getByRole("group", { name: "Confirm: change the role of Tomas Whitcombe" });
    expect(confirm).toHaveTextContent("from actuary to manager");
    await userEvent.click(within(confirm).getByRole("button", { name: "Cancel" }));
    expect(select).toHaveValue("actuary");

    await userEvent.selectOptions(select, "manager");
    await userEvent.click(screen.getByRole("button", { name: "Yes, change role" }));
    expect(await screen.findByRole("alert")).toHaveTextContent("Give a reason of at least 3 characters.");
    expect(api.count("PATCH", "/api/users/u-act")).toBe(0);

    await userEvent.type(screen.getByLabelText("Reason (kept in the audit log)"), "Leads the review desk from May.");
    await userEvent.click(screen.getByRole("button", { name: "Yes, change role" }));
    await waitFor(() => expect(screen.queryByRole("group", { name: /Confirm: change the role/ })).toBeNull());
    expect(api.calls.find((c) => c.method === "PATCH")?.body).toEqual({ role: "manager", reason: "Leads the review desk from May." });
    await waitFor(() => expect(screen.getByRole("combobox", { name: "Role of Tomas Whitcombe" })).toHaveValue("manager"));
  });

  it("shows the server's sentence when it refuses and keeps the reason for another try", async () => {
    usersApi({ status: 403, code: "self_role_change", message: "An admin cannot change their own role; ask another admin." });
    renderWithClient(<Harness />);
    await userEvent.selectOptions(await screen.findByRole("combobox", { name: "Role of Tomas Whitcombe" }), "analyst");
    await userEvent.type(screen.getByLabelText("Reason (kept in the audit log)"), "Back to modelling.");
    await userEvent.click(screen.getByRole("button", { name: "Yes, change role" }));
    expect(await screen.findByRole("alert")).toHaveTextContent("An admin cannot change their own role; ask another admin.");
    expect(screen.getByLabelText("Reason (kept in the audit log)")).toHaveValue("Back to modelling.");
  });
});
