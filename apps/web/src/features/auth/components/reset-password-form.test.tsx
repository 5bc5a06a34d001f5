import { fireEvent, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { ResetPasswordForm } from "./reset-password-form";

// The server's side is better-auth's POST /api/auth/reset-password { token, newPassword }
// (docs/API.md): 10–128 characters, 400 INVALID_TOKEN once the token is used or expired.

afterEach(() => vi.unstubAllGlobals());

describe("ResetPasswordForm", () => {
  it("checks length and the repeat beside the fields before sending anything", async () => {
    const api = stubFetch(() => ({ body: { status: true } }));
    renderWithClient(<ResetPasswordForm token="tok-1" onDone={() => {}} />);
    await userEvent.type(screen.getByLabelText("New password"), "short-pw");
    await userEvent.type(screen.getByLabelText("Repeat new password"), "short-px");
    fireEvent.click(screen.getByRole("button", { name: "Set new password" }));
    expect(await screen.findByText("Use at least 10 characters")).toBeInTheDocument();
    expect(screen.getByLabelText("Repeat new password")).toHaveAccessibleDescription("The two passwords differ");
    expect(api.calls).toHaveLength(0);
  });

  it("sends the token with the new password and reports success", async () => {
    const api = stubFetch((req) => (req.path === "/api/auth/reset-password" ? { body: { status: true } } : undefined));
    const onDone = vi.fn();
    renderWithClient(<ResetPasswordForm token="tok-2" onDone={onDone} />);
    await userEvent.type(screen.getByLabelText("New password"), "harbour-fresh-start-7");
    await userEvent.type(screen.getByLabelText("Repeat new password"), "harbour-fresh-start-7");
    await userEvent.click(screen.getByRole("button", { name: "Set new password" }));
    await vi.waitFor(() => expect(onDone).toHaveBeenCalledTimes(1));
    expect(api.calls.map((c) => [c.method, c.path, c.body])).toEqual([["POST", "/api/auth/reset-password", { token: "tok-2", newPassword: "harbour-fresh-start-7" }]]);
  });

  it("explains a used or expired link", async () => {
    stubFetch(() => ({ status: 400, body: { code: "INVALID_TOKEN", message: "Invalid token" } }));
    const onDone = vi.fn();
    renderWithClient(<ResetPasswordForm token="tok-used" onDone={onDone} />);
    await userEvent.type(screen.getByLabelText("New password"), "harbour-fresh-start-7");
    await userEvent.type(screen.getByLabelText("Repeat new password"), "harbour-fresh-start-7");
    await userEvent.click(screen.getByRole("button", { name: "Set new password" }));
    expect(await screen.findByRole("alert")).toHaveTextContent("This reset link has been used or has expired. Ask for a new one.");
    expect(onDone).not.toHaveBeenCalled();
  });
});
