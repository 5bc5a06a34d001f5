import { fireEvent, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { ForgotPasswordForm } from "./forgot-password-form";

// The server's side is better-auth's POST /api/auth/request-password-reset (docs/API.md): it
// answers 200 with the same body for any address, so the page may not tell them apart either.

afterEach(() => vi.unstubAllGlobals());

const neutralAnswer = { status: true, message: "If this email exists in our system, check your email for the reset link" };

describe("ForgotPasswordForm", () => {
  it("asks for a missing or malformed address beside the field and sends nothing", async () => {
    const api = stubFetch(() => ({ body: neutralAnswer }));
    renderWithClient(<ForgotPasswordForm />);
    fireEvent.click(screen.getByRole("button", { name: "Send reset link" }));
    expect(await screen.findByText("Enter your email address")).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText("Email"), "not-an-address");
    fireEvent.click(screen.getByRole("button", { name: "Send reset link" }));
    expect(await screen.findByText("Enter a valid email address")).toBeInTheDocument();
    expect(screen.getByLabelText("Email")).toHaveAccessibleDescription("Enter a valid email address");
    expect(api.calls).toHaveLength(0);
  });

  it("sends the address and confirms without saying whether an account exists", async () => {
    const api = stubFetch((req) => (req.path === "/api/auth/request-password-reset" ? { body: neutralAnswer } : undefined));
    renderWithClient(<ForgotPasswordForm />);
    await userEvent.type(screen.getByLabelText("Email"), "someone@harbourline.example");
    await userEvent.click(screen.getByRole("button", { name: "Send reset link" }));
    const status = await screen.findByRole("status");
    expect(status).toHaveTextContent("If an account uses someone@harbourline.example, a link to choose a new password is on its way.");
    expect(api.calls.map((c) => [c.method, c.path, c.body])).toEqual([["POST", "/api/auth/request-password-reset", { email: "someone@harbourline.example" }]]);
  });

  it("says to wait when the server limits requests", async () => {
    stubFetch(() => ({ status: 429, body: { message: "Too many requests" } }));
    renderWithClient(<ForgotPasswordForm />);
    await userEvent.type(screen.getByLabelText("Email"), "someone@harbourline.example");
    await userEvent.click(screen.getByRole("button", { name: "Send reset link" }));
    expect(await screen.findByRole("alert")).toHaveTextContent("Too many requests. Wait a minute, then try again.");
  });
});
