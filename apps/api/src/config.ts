import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { issueDetails } from "@plumeline/contracts";
import { z } from "zod";
import { LOG_LEVELS, type LogLevel } from "./logging/logger.js";

/** The repository root, so defaults (data folder, web build) do not depend on the cwd. */
export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  PORT: z.coerce.number().int().min(0).max(65535).default(4000),
  HOST: z.string().min(1).default("0.0.0.0"),
  PLUMELINE_DATA_DIR: z.string().min(1).optional(),
  DATABASE_FILE: z.string().min(1).optional(),
  AUTH_SECRET: z.string().min(32, "must be at least 32 characters").optional(),
  PUBLIC_ORIGIN: z.url().optional(),
  TRUSTED_ORIGINS: z.string().optional(),
  SMTP_URL: z.url().optional(),
  SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  MAIL_FROM: z.string().min(3).default("Plumeline <no-reply@plumeline.invalid>"),
  WORKERS: z.coerce.number().int().min(0).max(64).optional(),
  QUEUE: z.enum(["sqlite", "bullmq"]).default("sqlite"),
  REDIS_URL: z.url().optional(),
  SIGN_IN_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  RUNS_QUEUED_PER_PERSON: z.coerce.number().int().min(1).max(1000).default(10),
  WEB_DIST: z.string().min(1).optional(),
  SEED_DEMO: z.enum(["true", "false"]).default("true"),
  LOG_LEVEL: z.enum(LOG_LEVELS).optional(),
});

export interface Config {
  env: "development" | "production" | "test";
  port: number;
  host: string;
  dataDir: string;
  databaseFile: string;
  authSecret: string;
  /** Origin the app is served from; cookies are `Secure` when it is https. */
  publicOrigin: string;
  trustedOrigins: string[];
  /** Unset: mail goes to the embedded SMTP server and lands in the outbox. */
  smtpUrl: string | undefined;
  /** Port of the embedded SMTP server; 0 picks a free one. */
  smtpPort: number;
  mailFrom: string;
  /** Engine threads in this process; 0 (QUEUE=bullmq only) = the API computes nothing itself. */
  workers: number;
  queue: "sqlite" | "bullmq";
  redisUrl: string | undefined;
  /** Sign-in attempts allowed per client address per minute. */
  signInRateLimit: number;
  /** Runs one person may have queued or running at once; the next is refused (429). */
  runsQueuedPerPerson: number;
  webDist: string;
  seedDemo: boolean;
  /** Least severe level written to the log; tests default to `silent`. */
  logLevel: LogLevel;
}

export class ConfigError extends Error {
  override name = "ConfigError";
}

/** Parses the environment once, fails fast naming every bad variable, and fills safe defaults. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = issueDetails(parsed.error).map((detail) => `${detail.path}: ${detail.message}`);
    throw new ConfigError(`Invalid configuration:\n  ${lines.join("\n  ")}`);
  }
  const e = parsed.data;
  if (e.QUEUE === "bullmq" && !e.REDIS_URL) throw new ConfigError("Invalid configuration:\n  REDIS_URL: required when QUEUE=bullmq");
  // Mailed links (run finished, review, reset) start with the public origin; without it each
  // process would fall back to its own port, and a worker's mail would point at the worker.
  if (e.NODE_ENV === "production" && !e.PUBLIC_ORIGIN)
    throw new ConfigError(
      "Invalid configuration:\n  PUBLIC_ORIGIN: required when NODE_ENV=production (the address people open; mailed links start with it)",
    );
  // WORKERS=0 means "this process computes nothing": only workers elsewhere (QUEUE=bullmq) could run the jobs.
  if (e.QUEUE === "sqlite" && e.WORKERS === 0)
    throw new ConfigError("Invalid configuration:\n  WORKERS: 0 needs QUEUE=bullmq (with the table queue nothing else would run the jobs)");

  const dataDir = path.resolve(repoRoot, e.PLUMELINE_DATA_DIR ?? "data");
  const publicOrigin = (e.PUBLIC_ORIGIN ?? `http://localhost:${e.PORT}`).replace(/\/$/, "");
  const extraOrigins = (e.TRUSTED_ORIGINS ?? "")
    .split(",")
    .map((o) => o.trim())
    .filter(Boolean);
  // The Vite dev server and the loopback spellings of this port are trusted in development only.
  const localOrigins =
    e.NODE_ENV === "development" ? [`http://localhost:${e.PORT}`, `http://127.0.0.1:${e.PORT}`, "http://localhost:5173"] : [];

  return {
    env: e.NODE_ENV,
    port: e.PORT,
    host: e.HOST,
    dataDir,
    databaseFile: path.resolve(dataDir, e.DATABASE_FILE ?? "plumeline.db"),
    authSecret: e.AUTH_SECRET ?? readOrCreateSecret(dataDir),
    publicOrigin,
    trustedOrigins: [...new Set([publicOrigin, ...localOrigins, ...extraOrigins])],
    smtpUrl: e.SMTP_URL,
    smtpPort: e.SMTP_PORT,
    mailFrom: e.MAIL_FROM,
    workers: e.WORKERS ?? os.availableParallelism(),
    queue: e.QUEUE,
    redisUrl: e.REDIS_URL,
    signInRateLimit: e.SIGN_IN_RATE_LIMIT,
    runsQueuedPerPerson: e.RUNS_QUEUED_PER_PERSON,
    webDist: path.resolve(repoRoot, e.WEB_DIST ?? "apps/web/dist"),
    seedDemo: e.SEED_DEMO === "true",
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === "test" ? "silent" : "info"),
  };
}

/** A secret generated on first start and kept in the data folder, so sessions survive restarts. */
function readOrCreateSecret(dataDir: string): string {
  const file = path.join(dataDir, "auth-secret");
  if (existsSync(file)) return readFileSync(file, "utf8").trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(32).toString("base64url");
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
