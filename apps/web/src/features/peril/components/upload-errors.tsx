import { isApiError } from "@/lib/api-error";
import { perilErrorHeading } from "../lib/peril-error-heading";

/**
 * An upload's problems as the server names them ("row 4, column F (loss200)": message), all
 * listed so the file can be fixed in one go, under a heading that says what kind of refusal it
 * was (problems in the file, too large, not allowed, unreachable); anything else as one sentence.
 */
export function UploadErrors({ error }: { error: unknown }) {
  if (!error) return null;
  const e = isApiError(error) ? error : null;
  // Row/column problems may come as 400 (today) or 422; either way the file is what needs fixing.
  const fileProblems = e !== null && e.details.length > 0 && (e.status === 400 || e.status === 422);
  const heading = fileProblems ? "The file cannot be saved as it is" : (perilErrorHeading(error) ?? "The upload failed");
  const message = e ? e.message : error instanceof Error ? error.message : "The server gave no reason.";
  return (
    <div role="alert" className="rounded-md border border-danger/40 bg-danger-soft px-4 py-3 text-sm">
      <p className="font-semibold text-danger">{heading}</p>
      <p className="mt-0.5 text-text">{message}</p>
      {e && e.details.length > 0 && (
        <ul className="mt-2 max-h-72 list-disc overflow-auto pl-5" aria-label="Problems in the file">
          {e.details.map((d, i) => (
            <li key={i}>
              <span className="font-mono text-xs">{d.path}</span> {d.message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
