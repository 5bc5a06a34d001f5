import { randomUUID } from "node:crypto";
import type { IncomingMessage, ServerResponse } from "node:http";
import type { Logger } from "pino";
import { pinoHttp, type HttpLogger } from "pino-http";
import { logger as processLogger } from "./logger.js";

/** Query parameters whose values never reach a log line (reset links carry a token). */
const SECRET_QUERY = /([?&](?:token|code|password|secret)=)[^&#]*/gi;

/** The request's path and query with secret parameter values replaced. */
export function redactUrl(url: string | undefined): string {
  return (url ?? "").replace(SECRET_QUERY, "$1[redacted]");
}

/**
 * One log line per request when its response ends: method, path, status and duration in ms
 * (`responseTime`), at `error` for 5xx and `info` otherwise. Headers are not logged at all, so
 * cookies and authorization never appear; the request id is echoed as `x-request-id`.
 */
export function httpLogger(logger: Logger = processLogger): HttpLogger {
  return pinoHttp({
    logger,
    quietReqLogger: true,
    genReqId: (_req: IncomingMessage, res: ServerResponse) => {
      const id = randomUUID();
      res.setHeader("x-request-id", id);
      return id;
    },
    customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? "error" : "info"),
    customSuccessMessage: (req, res) => `${req.method ?? "?"} ${redactUrl(fullUrl(req))} ${res.statusCode}`,
    customErrorMessage: (req, res) => `${req.method ?? "?"} ${redactUrl(fullUrl(req))} ${res.statusCode} failed`,
    serializers: {
      req: (req: { id: string; method: string; url: string }) => ({ id: req.id, method: req.method, url: redactUrl(req.url) }),
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
  });
}

/** Express rewrites `req.url` inside mounted routers; `originalUrl` keeps what the client asked for. */
function fullUrl(req: IncomingMessage & { originalUrl?: string }): string | undefined {
  return req.originalUrl ?? req.url;
}
