import { buildUrl } from "@/lib/api-client";
import { ApiError, apiErrorFromBody } from "@/lib/api-error";

/**
 * Fetches a past export rebuilt by the server and saves it under its recorded file name. The
 * server refuses (409) when the rebuilt bytes do not match the recorded checksum; that refusal
 * comes back as an ApiError with its message, so a wrong file is never saved in its place.
 */
export async function downloadExportAgain(exportId: string, fileName: string): Promise<void> {
  let res: Response;
  try {
    res = await fetch(buildUrl(`/api/exports/${encodeURIComponent(exportId)}/file`), { credentials: "include" });
  } catch {
    throw new ApiError(0, "network_error", "The server could not be reached. Check your connection and try again.");
  }
  if (!res.ok) {
    const text = await res.text();
    let body: unknown = null;
    try {
      body = JSON.parse(text);
    } catch {
      body = text;
    }
    throw apiErrorFromBody(res.status, body, `The export could not be downloaded again (status ${res.status}).`);
  }
  const url = URL.createObjectURL(await res.blob());
  const link = document.createElement("a");
  link.href = url;
  link.download = fileName;
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
