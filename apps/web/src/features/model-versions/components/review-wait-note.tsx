import type { ModelVersion } from "@plumeline/contracts";
import { formatDateTime } from "@/lib/format";

/**
 * While a version waits for review, its page says so in words: who decides, who was told,
 * and what that means meanwhile. Submitting otherwise only swaps a badge and hides the form,
 * which leaves the author guessing whether anything was sent.
 */
export function ReviewWaitNote({ version, isAuthor }: { version: ModelVersion; isAuthor: boolean }) {
  if (version.status !== "in-review") return null;
  const when = version.submittedAt ? ` on ${formatDateTime(version.submittedAt)}` : "";
  const kind = version.changeClass ? ` as a ${version.changeClass} change` : "";
  return (
    <p role="status" className="mb-6 rounded-md border border-line bg-surface-2 px-4 py-3 text-sm">
      <span className="font-medium text-ink">Waiting for review.</span> Submitted{when}
      {kind}. A manager other than {isAuthor ? "you" : "the author"} approves or rejects it; the managers were told by mail
      {isAuthor ? " and you will get the decision by mail" : ""}. Until then it cannot be edited, and runs made with it are exploratory.
    </p>
  );
}
