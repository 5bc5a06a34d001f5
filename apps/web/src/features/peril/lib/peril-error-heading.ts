import { isApiError } from "@/lib/api-error";

/**
 * A heading that says what kind of refusal a peril-lens call met, keyed on the API's stable
 * status and code (docs/API.md) rather than its prose, so the server's own sentence can sit
 * under it unchanged. `null` when the failure is not one of these (the caller keeps its own
 * heading, or the shared ErrorState picks one).
 */
export function perilErrorHeading(error: unknown): string | null {
  if (!isApiError(error)) return null;
  switch (error.code) {
    case "peril_profile_locked":
      return "This profile is locked";
    case "peril_profile_in_use":
      return "A draft model version still names this profile";
    case "not_owner":
      return "Only the profile's creator can change it";
    case "missing_permission":
      return "Your role cannot make this change";
    case "payload_too_large":
      return "The file is too large";
    case "network_error":
      return "Server unreachable";
  }
  // 422 is not sent today (the API uses 400 for every validation failure) but means the same.
  if (error.status === 400 || error.status === 422) return "Some fields need fixing";
  if (error.status === 404) return "Not found";
  return null;
}
