import type { StoredDraft } from "@/lib/draft-storage";
import { formatDateTime } from "@/lib/format";

/**
 * Says what the form started from when a draft was found in this browser: restored (with the
 * way to throw it away) or dropped because it no longer fits the form (so nothing vanishes
 * without a word).
 */
export function RestoredDraftNotice({
  found,
  onDiscard,
  onDismiss,
}: {
  found: StoredDraft<unknown>;
  onDiscard: () => void;
  onDismiss: () => void;
}) {
  if (found.status === "none") return null;
  if (found.status === "dropped")
    return (
      <div
        role="status"
        className="mb-4 flex flex-wrap items-center gap-3 rounded-md border border-line-strong bg-surface-2 px-4 py-2 text-sm"
      >
        <span>
          An unsaved draft{found.savedAt ? ` from ${formatDateTime(found.savedAt)}` : ""} could not be restored: {found.reason}. It was
          removed; the form shows the saved values.
        </span>
        <button type="button" className="font-medium text-accent underline" onClick={onDismiss}>
          OK
        </button>
      </div>
    );
  return (
    <div
      role="status"
      className="mb-4 flex flex-wrap items-center gap-3 rounded-md border border-accent/40 bg-accent-soft px-4 py-2 text-sm"
    >
      <span>Restored unsaved draft from {formatDateTime(found.savedAt)}.</span>
      <button type="button" className="font-medium text-accent underline" onClick={onDiscard}>
        Discard it
      </button>
    </div>
  );
}
