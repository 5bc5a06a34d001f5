import { useState, type SubmitEvent } from "react";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { InlineError } from "@/components/ui/states";
import { useRequestPasswordReset } from "../api/request-password-reset";

export const forgotPasswordSchema = z.object({
  email: z.string().trim().min(1, "Enter your email address").pipe(z.email("Enter a valid email address")),
});

/**
 * Asks for a reset link. The confirmation reads the same whether or not the address has an
 * account, as the server's answer does: the page must not tell who works here.
 */
export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const [error, setError] = useState<string>();
  const [sentTo, setSentTo] = useState<string>();

  function submit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const parsed = forgotPasswordSchema.safeParse(Object.fromEntries(new FormData(e.currentTarget)));
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    request.mutate(parsed.data.email, { onSuccess: () => setSentTo(parsed.data.email) });
  }

  if (sentTo) {
    return (
      <p role="status" className="rounded-md border border-ok/60 bg-ok-soft px-3 py-2 text-sm text-ok">
        If an account uses {sentTo}, a link to choose a new password is on its way. It works once, within an hour. No mail? Check the address,
        or ask an administrator.
      </p>
    );
  }
  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-4">
      <Field label="Email" error={error}>
        {(p) => <Input {...p} name="email" type="email" autoComplete="username" autoFocus />}
      </Field>
      <InlineError error={request.error} />
      <Button type="submit" disabled={request.isPending}>
        {request.isPending ? "Sending…" : "Send reset link"}
      </Button>
    </form>
  );
}
