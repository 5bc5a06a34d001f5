import { useState } from "react";
import { roles, updateUserBodySchema, type Role, type User } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Field, Select, Textarea } from "@/components/ui/field";
import { InlineError } from "@/components/ui/states";
import { isApiError } from "@/lib/api-error";

/**
 * A person's role, changed only after confirmation and with a reason that goes into the
 * audit log. One's own role is shown as text: no admin may change their own rights (the
 * server refuses it too), so the control is not offered at all.
 */
export function RoleChange({
  user,
  isSelf,
  saving,
  error,
  onConfirm,
}: {
  user: User;
  isSelf: boolean;
  saving: boolean;
  error: unknown;
  onConfirm: (change: { role: Role; reason: string }) => Promise<unknown>;
}) {
  const [pending, setPending] = useState<Role | null>(null);
  const [reason, setReason] = useState("");
  const [reasonError, setReasonError] = useState<string>();
  if (isSelf) {
    return (
      <span title="Another admin can change your role">
        {user.role} <span className="text-xs text-muted">(you)</span>
      </span>
    );
  }
  const close = () => {
    setPending(null);
    setReason("");
    setReasonError(undefined);
  };
  const confirm = async () => {
    if (!pending) return;
    // Same rule as the server (the contract's schema), so the message appears before a round trip.
    const parsed = updateUserBodySchema.safeParse({ role: pending, reason });
    if (!parsed.success) {
      setReasonError(parsed.error.issues.find((i) => i.path[0] === "reason")?.message ?? "Give a reason.");
      return;
    }
    setReasonError(undefined);
    try {
      await onConfirm(parsed.data);
      close();
    } catch {
      // The refusal is shown below (the mutation's error); the admin can edit the reason or cancel.
    }
  };
  const serverReasonError = isApiError(error) ? error.details.find((d) => d.path === "reason")?.message : undefined;
  return (
    <div className="flex flex-col gap-2">
      <Select
        aria-label={`Role of ${user.name}`}
        value={pending ?? user.role}
        className="w-36 py-1"
        disabled={saving}
        onChange={(e) => {
          const next = e.target.value as Role;
          if (next === user.role) close();
          else setPending(next);
        }}
      >
        {roles.map((r) => (
          <option key={r}>{r}</option>
        ))}
      </Select>
      {pending && (
        <div role="group" aria-label={`Confirm: change the role of ${user.name}`} className="flex max-w-xs flex-col gap-2">
          <p className="text-sm">
            Change {user.name} from {user.role} to {pending}? Their permissions change at once.
          </p>
          <Field label="Reason (kept in the audit log)" error={reasonError ?? serverReasonError}>
            {(p) => <Textarea {...p} className="min-h-14" value={reason} maxLength={500} onChange={(e) => setReason(e.target.value)} />}
          </Field>
          <div className="flex gap-2">
            <Button size="sm" disabled={saving} onClick={() => void confirm()}>
              {saving ? "Saving…" : "Yes, change role"}
            </Button>
            <Button size="sm" variant="secondary" onClick={close}>
              Cancel
            </Button>
          </div>
          {!serverReasonError && <InlineError error={error} />}
        </div>
      )}
    </div>
  );
}
