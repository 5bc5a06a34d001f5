/** One problem with one field, as the API reports it: `{ path: "members", message: "must be at least 1" }`. */
export interface FieldIssue {
  path: string;
  message: string;
}

/**
 * A failed API call, carrying the server's stable code so screens can react to the kind of
 * failure (403 explains a missing permission, 400 places messages beside fields) rather than
 * to prose. Network failures get status 0 and code "network_error".
 */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: FieldIssue[];

  constructor(status: number, code: string, message: string, details: FieldIssue[] = []) {
    super(message);
    this.name = "ApiError";
    this.status = status;
    this.code = code;
    this.details = details;
  }

  /** Messages keyed by field path, for forms: { "members": "must be at least 1" }. */
  fieldMessages(): Record<string, string> {
    const out: Record<string, string> = {};
    for (const d of this.details) if (d.path && !(d.path in out)) out[d.path] = d.message;
    return out;
  }
}

export function isApiError(e: unknown): e is ApiError {
  return e instanceof ApiError;
}

/** Turns any response body into an ApiError, tolerating bodies that are not our error shape. */
export function apiErrorFromBody(status: number, body: unknown, fallback: string): ApiError {
  const err = (body as { error?: { code?: unknown; message?: unknown; details?: unknown } } | null)?.error;
  if (err && typeof err === "object") {
    const details = Array.isArray(err.details)
      ? err.details
          .filter((d): d is { path?: unknown; message?: unknown } => typeof d === "object" && d !== null)
          .map((d) => ({ path: asText(d.path), message: asText(d.message) }))
      : [];
    return new ApiError(
      status,
      typeof err.code === "string" ? err.code : `http_${status}`,
      typeof err.message === "string" ? err.message : fallback,
      details,
    );
  }
  return new ApiError(status, `http_${status}`, fallback);
}

/** A detail field as text: strings and numbers as they are, a path array joined, anything else empty. */
function asText(v: unknown): string {
  if (typeof v === "string") return v;
  if (typeof v === "number") return String(v);
  if (Array.isArray(v)) return v.join(",");
  return "";
}
