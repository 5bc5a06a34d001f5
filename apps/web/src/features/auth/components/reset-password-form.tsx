import { useState, type SubmitEvent } from "react";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { InlineError } from "@/components/ui/states";
import { useResetPassword } from "../api/reset-password";
import { NEW_PASSWORD_HINT, newPasswordSchema } from "../password-rules";
import { fieldErrors } from "@/lib/field-errors";

export const resetPasswordSchema = z
  .object({ newPassword: newPasswordSchema, repeat: z.string() })
  .refine((v) => v.newPassword === v.repeat, { path: ["repeat"], error: "The two passwords differ" });

type Name = "newPassword" | "repeat";

/** Sets a new password with the token from the mailed link. */
export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const reset = useResetPassword();
  const [errors, setErrors] = useState<Partial<Record<Name, string>>>({});

  function submit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const parsed = resetPasswordSchema.safeParse(Object.fromEntries(new FormData(e.currentTarget)));
    if (!parsed.success) {
      setErrors(fieldErrors<Name>(parsed.error));
      return;
    }
    setErrors({});
    reset.mutate({ token, newPassword: parsed.data.newPassword }, { onSuccess: onDone });
  }

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-4">
      <Field label="New password" error={errors.newPassword} hint={NEW_PASSWORD_HINT}>
        {(p) => <Input {...p} name="newPassword" type="password" autoComplete="new-password" autoFocus />}
      </Field>
      <Field label="Repeat new password" error={errors.repeat}>
        {(p) => <Input {...p} name="repeat" type="password" autoComplete="new-password" />}
      </Field>
      <InlineError error={reset.error} />
      <Button type="submit" disabled={reset.isPending}>
        {reset.isPending ? "Saving…" : "Set new password"}
      </Button>
    </form>
  );
}
