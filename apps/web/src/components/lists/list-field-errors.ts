import { isApiError } from "@/lib/api-error";

/**
 * A list's 400 as messages keyed by query field (`from`, `sort`, …), so each one is shown
 * beside its control; empty for any other failure.
 */
export function listFieldErrors(error: unknown): Record<string, string> {
  return isApiError(error) && error.status === 400 ? error.fieldMessages() : {};
}

/** The heading for a list that failed: a refused filter is named as such, not as a crash. */
export function listErrorTitle(error: unknown): string | undefined {
  return isApiError(error) && error.status === 400 ? "These filters could not be used" : undefined;
}
