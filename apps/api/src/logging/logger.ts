import { pino, type DestinationStream, type Logger, type LevelWithSilent } from "pino";

/** Levels LOG_LEVEL accepts, most to least severe; `silent` logs nothing. */
export const LOG_LEVELS = ["fatal", "error", "warn", "info", "debug", "trace", "silent"] as const satisfies readonly LevelWithSilent[];
export type LogLevel = (typeof LOG_LEVELS)[number];

/**
 * Fields replaced by "[redacted]" wherever a log line carries them: session cookies, bearer
 * headers, passwords, reset tokens, secrets. The request serializer (http-logger.ts) already
 * leaves headers out; this is the net for anything logged by hand.
 */
export const REDACTED_PATHS = [
  "req.headers.cookie",
  "req.headers.authorization",
  'res.headers["set-cookie"]',
  "headers.cookie",
  "headers.authorization",
  "*.password",
  "*.newPassword",
  "*.currentPassword",
  "*.token",
  "*.authSecret",
  "*.secret",
  "*.cookie",
  "*.authorization",
];

/** A JSON logger (one object per line on stdout, pino's format) at `level`. */
export function createLogger(level: LogLevel, destination?: DestinationStream): Logger {
  const options = { level, redact: { paths: REDACTED_PATHS, censor: "[redacted]" }, base: { service: "plumeline-api" } };
  return destination ? pino(options, destination) : pino(options);
}

/**
 * The process's logger. Its level starts from LOG_LEVEL (silent under vitest), and
 * createContext sets it from the validated config, so tests stay quiet unless asked.
 */
export const logger: Logger = createLogger(initialLevel());

function initialLevel(): LogLevel {
  const fromEnv = process.env.LOG_LEVEL;
  if (fromEnv && (LOG_LEVELS as readonly string[]).includes(fromEnv)) return fromEnv as LogLevel;
  return process.env.VITEST ? "silent" : "info";
}
