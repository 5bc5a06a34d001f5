import { fireEvent, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { ACCOUNT_DEACTIVATED_MESSAGE } from "@plumeline/contracts";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import { SignInForm } from "./sign-in-form";

afterEach(() => vi.unstubAllGlobals());

describe("SignInForm", () => {
  it("asks for the missing email and password beside the fields", async () => {
    renderWithClient(<SignInForm onSignedIn={() => {}} />);
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByText("Enter your email address")).toBeInTheDocument();
    expect(screen.getByLabelText("Password")).toHaveAccessibleDescription("Enter your password");
    await userEvent.type(screen.getByLabelText("Email"), "not-an-address");
    fireEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByText("Enter a valid email address")).toBeInTheDocument();
  });

  // better-auth's admin plugin refuses a banned (deactivated) user's sign-in with 403 and code
  // BANNED_USER (docs/API.md); a wrong password is its 401.
  it("tells a deactivated person to ask an administrator, and a wrong password apart from it", async () => {
    let refusal = { status: 403, body: { code: "BANNED_USER", message: "banned" } };
    stubFetch((req) => (req.path === "/api/auth/sign-in/email" ? refusal : undefined));
    const onSignedIn = vi.fn();
    renderWithClient(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText("Email"), "former@harbourline.example");
    await userEvent.type(screen.getByLabelText("Password"), "whatever-it-was");
    await userEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByRole("alert")).toHaveTextContent(ACCOUNT_DEACTIVATED_MESSAGE);

    refusal = { status: 401, body: { code: "INVALID_EMAIL_OR_PASSWORD", message: "Invalid email or password" } };
    await userEvent.click(screen.getByRole("button", { name: "Sign in" }));
    expect(await screen.findByText("Email or password is not right.")).toBeInTheDocument();
    expect(onSignedIn).not.toHaveBeenCalled();
  });
});
