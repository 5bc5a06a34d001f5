import type { ErrorDetail } from "@plumeline/contracts";

/** The statuses a service may raise on purpose; anything else becomes a generic 500. */
export type AppErrorStatus = 400 | 401 | 403 | 404 | 409 | 413 | 429;

/** A failure a service raises on purpose: carries its HTTP status and a stable snake_case code. */
export class AppError extends Error {
  override name = "AppError";
  constructor(
    readonly status: AppErrorStatus,
    readonly code: string,
    message: string,
    readonly details?: ErrorDetail[],
  ) {
    super(message);
  }
}

export function badRequest(details: ErrorDetail[], message = "The request has invalid fields."): AppError {
  return new AppError(400, "validation_failed", message, details);
}

export function unauthorized(message = "Sign in to continue."): AppError {
  return new AppError(401, "unauthenticated", message);
}

export function forbidden(message: string, code = "forbidden"): AppError {
  return new AppError(403, code, message);
}

export function notFound(entity: string, id: string | number): AppError {
  return new AppError(404, "not_found", `${entity} ${id} does not exist.`);
}

export function conflict(message: string, code = "conflict"): AppError {
  return new AppError(409, code, message);
}

export function payloadTooLarge(message: string): AppError {
  return new AppError(413, "payload_too_large", message);
}

export function tooManyRequests(message: string, code = "too_many_requests"): AppError {
  return new AppError(429, code, message);
}
