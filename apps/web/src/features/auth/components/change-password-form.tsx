import { useState, type SubmitEvent } from "react";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { InlineError } from "@/components/ui/states";
import { useChangePassword } from "../api/change-password";
import { NEW_PASSWORD_HINT, newPasswordSchema } from "../password-rules";
import { fieldErrors } from "@/lib/field-errors";

export const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, "Enter the password from your invitation mail"),
    newPassword: newPasswordSchema,
    repeat: z.string(),
  })
  .refine((v) => v.newPassword === v.repeat, { path: ["repeat"], error: "The two new passwords differ" })
  .refine((v) => v.newPassword !== v.currentPassword, { path: ["newPassword"], error: "Choose a password different from the one you were sent" });

type Name = "currentPassword" | "newPassword" | "repeat";

/**
 * An account invited before invitations mailed a link (it still holds a mailed one-time
 * password) must replace that password before anything else.
 */
export function ChangePasswordForm() {
  const change = useChangePassword();
  const [errors, setErrors] = useState<Partial<Record<Name, string>>>({});
  function submit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const parsed = changePasswordSchema.safeParse(Object.fromEntries(new FormData(e.currentTarget)));
    if (!parsed.success) {
      setErrors(fieldErrors<Name>(parsed.error));
      return;
    }
    setErrors({});
    change.mutate({ currentPassword: parsed.data.currentPassword, newPassword: parsed.data.newPassword });
  }
  return (
    <div className="mx-auto mt-16 max-w-sm rounded-lg border border-line bg-surface p-6 shadow-card">
      <h1 className="text-xl font-semibold">Choose your password</h1>
      <p className="mb-5 mt-1 text-sm text-muted">The password in your invitation works once. Set your own to continue.</p>
      <form noValidate onSubmit={submit} className="flex flex-col gap-4">
        <Field label="Password from the invitation" error={errors.currentPassword}>
          {(p) => <Input {...p} name="currentPassword" type="password" autoComplete="current-password" />}
        </Field>
        <Field label="New password" error={errors.newPassword} hint={NEW_PASSWORD_HINT}>
          {(p) => <Input {...p} name="newPassword" type="password" autoComplete="new-password" />}
        </Field>
        <Field label="Repeat new password" error={errors.repeat}>
          {(p) => <Input {...p} name="repeat" type="password" autoComplete="new-password" />}
        </Field>
        <InlineError error={change.error} />
        <Button type="submit" disabled={change.isPending}>
          {change.isPending ? "Saving…" : "Set password"}
        </Button>
      </form>
    </div>
  );
}
