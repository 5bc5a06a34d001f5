import { screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { stubFetch } from "@/testing/fetch-stub";
import { renderWithClient } from "@/testing/render-with-client";
import ResetPasswordPage from "./reset-password-page";
import SignInPage from "./sign-in-page";

// The mailed link is <PUBLIC_ORIGIN>/reset-password?token=… (docs/API.md); the sign-in page is the way in.

afterEach(() => vi.unstubAllGlobals());

const signedOut = () => stubFetch(() => ({ status: 401, body: { error: { code: "unauthenticated", message: "Sign in first." } } }));

describe("the way to a new password", () => {
  it("starts from a 'Forgot password?' link on the sign-in page", async () => {
    signedOut();
    renderWithClient(<SignInPage />);
    expect(await screen.findByRole("link", { name: "Forgot password?" })).toHaveAttribute("href", "/forgot-password");
    expect(screen.getByRole("heading", { level: 1, name: "Sign in" })).toBeInTheDocument();
  });

  it("says so when the reset page is opened without the mailed token, and offers a new link", () => {
    signedOut();
    renderWithClient(<ResetPasswordPage />);
    expect(screen.getByRole("alert")).toHaveTextContent("This page needs the link from your reset mail.");
    expect(screen.queryByLabelText("New password")).not.toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Ask for a new link" })).toHaveAttribute("href", "/forgot-password");
  });
});
