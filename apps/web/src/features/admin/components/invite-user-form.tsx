import { useState, type SubmitEvent } from "react";
import { inviteUserBodySchema, roles } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { isApiError } from "@/lib/api-error";
import { useInviteUser } from "../api/save-user";
import { fieldErrors } from "@/lib/field-errors";

type Name = "email" | "name" | "role";

/** Invites a user: the server creates the account and mails a one-time link to set a password. */
export function InviteUserForm() {
  const invite = useInviteUser();
  const [errors, setErrors] = useState<Partial<Record<Name, string>>>({});
  const [done, setDone] = useState<string>();
  function submit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const parsed = inviteUserBodySchema.safeParse(Object.fromEntries(new FormData(form)));
    if (!parsed.success) {
      const next = fieldErrors<Name>(parsed.error);
      // The contract gives zod's generic email messages (written for API clients); people get a plainer one.
      if (next.email) next.email = "Enter a valid email address";
      setErrors(next);
      return;
    }
    setErrors({});
    invite.mutate(parsed.data, {
      onSuccess: (u) => {
        setDone(`Invitation sent to ${u.email}: a link to choose their password. The mail is in the outbox.`);
        form.reset();
      },
      onError: (err) => {
        if (isApiError(err) && err.status === 400) setErrors(Object.fromEntries(err.details.map((d) => [d.path, d.message])));
      },
    });
  }
  return (
    <form noValidate onSubmit={submit} className="grid items-start gap-3 md:grid-cols-[1fr_1fr_10rem_auto]">
      <Field label="Email" error={errors.email}>
        {(p) => <Input {...p} name="email" type="email" />}
      </Field>
      <Field label="Name" error={errors.name}>
        {(p) => <Input {...p} name="name" />}
      </Field>
      <Field label="Role" error={errors.role}>
        {(p) => (
          <Select {...p} name="role" defaultValue="analyst">
            {roles.map((r) => (
              <option key={r}>{r}</option>
            ))}
          </Select>
        )}
      </Field>
      <Button type="submit" className="md:mt-6" disabled={invite.isPending}>
        {invite.isPending ? "Inviting…" : "Invite"}
      </Button>
      {done && (
        <p role="status" className="text-sm text-ok md:col-span-4">
          {done}
        </p>
      )}
      {invite.error && !(isApiError(invite.error) && invite.error.status === 400) && (
        <div className="md:col-span-4">
          <ErrorState error={invite.error} />
        </div>
      )}
    </form>
  );
}
