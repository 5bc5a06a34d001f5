import { fireEvent, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderWithClient } from "@/testing/render-with-client";
import { SignInForm } from "./sign-in-form";

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
});
