import { isApiError } from "@/lib/api-error";

/**
 * An upload's problems as the server names them ("row 4, column F (loss200)": message), all
 * listed so the file can be fixed in one go; anything else as one sentence.
 */
export function UploadErrors({ error }: { error: unknown }) {
  if (!error) return null;
  const e = isApiError(error) ? error : null;
  return (
    <div role="alert" className="rounded-md border border-danger/40 bg-danger-soft px-4 py-3 text-sm">
      <p className="font-semibold text-danger">{e ? e.message : error instanceof Error ? error.message : "The upload failed."}</p>
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
