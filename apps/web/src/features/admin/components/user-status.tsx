import { useState } from "react";
import type { User } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";

/** Active or deactivated, in words (not colour alone). */
export function UserStatusBadge({ deactivated }: { deactivated: boolean }) {
  return (
    <span
      className={cx(
        "inline-flex items-center rounded-full border px-2 text-xs font-medium",
        deactivated ? "border-danger/60 bg-danger-soft text-danger" : "border-ok/60 bg-ok-soft text-ok",
      )}
    >
      {deactivated ? "Deactivated" : "Active"}
    </span>
  );
}

/**
 * Deactivate / reactivate with a confirmation step: deactivating signs the person out at
 * once, so one stray click must not do it. An admin cannot deactivate themselves.
 */
export function UserStatusAction({
  user,
  isSelf,
  saving,
  onSetStatus,
}: {
  user: User;
  isSelf: boolean;
  saving: boolean;
  onSetStatus: (deactivated: boolean) => void;
}) {
  const [confirming, setConfirming] = useState(false);
  const verb = user.deactivated ? "Reactivate" : "Deactivate";
  if (!confirming) {
    return (
      <Button
        variant={user.deactivated ? "secondary" : "ghost"}
        size="sm"
        aria-label={`${verb} ${user.name}`}
        disabled={isSelf || saving}
        title={isSelf ? "You cannot deactivate your own account; ask another admin" : undefined}
        onClick={() => setConfirming(true)}
      >
        {saving ? "Saving…" : verb}
      </Button>
    );
  }
  const consequence = user.deactivated
    ? `${user.name} can sign in again with their password.`
    : `${user.name} is signed out at once and cannot sign in until reactivated. Their runs, versions and audit rows stay theirs.`;
  return (
    <div role="group" aria-label={`Confirm: ${verb.toLowerCase()} ${user.name}`} className="flex max-w-xs flex-col gap-2">
      <p className="text-sm">{consequence}</p>
      <div className="flex gap-2">
        <Button
          size="sm"
          variant={user.deactivated ? "primary" : "danger"}
          onClick={() => {
            setConfirming(false);
            onSetStatus(!user.deactivated);
          }}
        >
          {`Yes, ${verb.toLowerCase()}`}
        </Button>
        <Button size="sm" variant="secondary" onClick={() => setConfirming(false)}>
          Cancel
        </Button>
      </div>
    </div>
  );
}
