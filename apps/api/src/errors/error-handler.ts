import type { ErrorRequestHandler } from "express";
import type { ApiError, ErrorDetail } from "@plumeline/contracts";
import { issueDetails } from "@plumeline/contracts";
import multer from "multer";
import { ZodError } from "zod";
import { DatabaseBusyError } from "../db/serialize-writes.js";
import { MalformedMultipartError } from "../uploads/single-file-upload.js";
import { AppError, type AppErrorStatus } from "./app-error.js";
import { redactUrl } from "../logging/http-logger.js";
import { logger } from "../logging/logger.js";

/** Seconds a client is asked to wait before retrying a write the database could not take. */
export const BUSY_RETRY_AFTER_SECONDS = 5;

/**
 * The status each AppError status maps to. Written out on purpose (not `err.status || 500`):
 * a status outside this table is a programming error and answers 500.
 */
const statusByAppErrorStatus: Record<AppErrorStatus, number> = {
  400: 400,
  401: 401,
  403: 403,
  404: 404,
  409: 409,
  413: 413,
  429: 429,
};

interface Mapped {
  status: number;
  body: ApiError;
  headers?: Record<string, string>;
}

/** Turns any thrown value into a status and the one error body shape (docs/API.md). */
export function toErrorResponse(err: unknown): Mapped {
  if (err instanceof AppError) {
    const status = statusByAppErrorStatus[err.status];
    if (status !== undefined) {
      return { status, body: { error: { code: err.code, message: err.message, ...(err.details ? { details: err.details } : {}) } } };
    }
  }
  if (err instanceof DatabaseBusyError) {
    return {
      status: 503,
      headers: { "Retry-After": String(BUSY_RETRY_AFTER_SECONDS) },
      body: { error: { code: "database_busy", message: `The database is busy with other changes; nothing was saved. Try again in ${BUSY_RETRY_AFTER_SECONDS} seconds.` } },
    };
  }
  if (err instanceof ZodError) {
    const details: ErrorDetail[] = issueDetails(err);
    return { status: 400, body: { error: { code: "validation_failed", message: "The request has invalid fields.", details } } };
  }
  if (err instanceof multer.MulterError) {
    if (err.code === "LIMIT_FILE_SIZE" || err.code === "LIMIT_FIELD_VALUE" || err.code === "LIMIT_FILE_COUNT") {
      return { status: 413, body: { error: { code: "payload_too_large", message: `Upload too large: ${err.message}.` } } };
    }
    return { status: 400, body: { error: { code: "bad_upload", message: err.message, details: [{ path: err.field ?? "file", message: err.message }] } } };
  }
  // body-parser errors carry `type` and a status: oversized or malformed JSON bodies.
  if (isBodyParserError(err)) {
    if (err.type === "entity.too.large") {
      return { status: 413, body: { error: { code: "payload_too_large", message: "The request body is too large." } } };
    }
    if (err.type === "entity.parse.failed") {
      return { status: 400, body: { error: { code: "malformed_json", message: "The request body is not valid JSON." } } };
    }
    if (err.type === "encoding.unsupported" || err.status === 415) {
      return {
        status: 415,
        body: { error: { code: "unsupported_content_encoding", message: "The request's Content-Encoding is not supported; send identity, gzip, deflate or br." } },
      };
    }
    // Any other client-side body failure (a gzip header on a plain body, a stream cut short).
    if (err.status >= 400 && err.status < 500) {
      return { status: 400, body: { error: { code: "malformed_body", message: "The request body could not be read as sent (check its Content-Encoding and length)." } } };
    }
  }
  if (err instanceof MalformedMultipartError) {
    return {
      status: 400,
      body: { error: { code: "malformed_multipart", message: `The upload is not well-formed multipart: ${err.message}.`, details: [{ path: "file", message: err.message }] } },
    };
  }
  return { status: 500, body: { error: { code: "internal_error", message: "Something went wrong on our side. It has been logged." } } };
}

function isBodyParserError(err: unknown): err is { type?: string; status: number } {
  if (typeof err !== "object" || err === null) return false;
  const e = err as { type?: unknown; status?: unknown; expose?: unknown };
  // body-parser's own errors carry a `type`; a stream error it wrapped (zlib's "incorrect
  // header check" for a gzip header on a plain body) only gets http-errors' status and expose.
  return typeof e.status === "number" && (typeof e.type === "string" || e.expose === true);
}

/** The ONE error handler, mounted last in app.ts. Logs only unexpected failures. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const { status, body, headers } = toErrorResponse(err);
  // req.log (pino-http) ties the line to the request's id; an app without it uses the process logger.
  const log = "log" in req ? req.log : logger;
  if (status === 500) log.error({ err }, `${req.method} ${redactUrl(req.originalUrl)} failed`);
  else if (status === 503) log.warn({ reason: (err as Error).message }, `${req.method} ${redactUrl(req.originalUrl)}: database busy`);
  if (res.headersSent) {
    res.end();
    return;
  }
  if (headers) res.set(headers);
  res.status(status).json(body);
};
