import { useState, type SubmitEvent } from "react";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { InlineError } from "@/components/ui/states";
import { useSignIn } from "../api/sign-in";
import { fieldErrors } from "@/lib/field-errors";

export const signInSchema = z.object({
  email: z.string().trim().min(1, "Enter your email address").pipe(z.email("Enter a valid email address")),
  password: z.string().min(1, "Enter your password"),
});

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const [errors, setErrors] = useState<Partial<Record<"email" | "password", string>>>({});

  function submit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = Object.fromEntries(new FormData(e.currentTarget));
    const parsed = signInSchema.safeParse(data);
    if (!parsed.success) {
      setErrors(fieldErrors<"email" | "password">(parsed.error));
      return;
    }
    setErrors({});
    signIn.mutate(parsed.data, { onSuccess: onSignedIn });
  }

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-4">
      <Field label="Email" error={errors.email}>
        {(p) => <Input {...p} name="email" type="email" autoComplete="username" autoFocus />}
      </Field>
      <Field label="Password" error={errors.password}>
        {(p) => <Input {...p} name="password" type="password" autoComplete="current-password" />}
      </Field>
      <InlineError error={signIn.error} />
      <Button type="submit" disabled={signIn.isPending}>
        {signIn.isPending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
