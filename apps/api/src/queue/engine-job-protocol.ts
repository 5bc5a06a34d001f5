import { createHash } from "node:crypto";
import { gunzipSync, gzipSync } from "node:zlib";
import type { RunSpec } from "@plumeline/contracts";

/**
 * What travels through BullMQ between the API and stateless engine workers (QUEUE=bullmq).
 * A worker needs nothing else: no database, no data folder. See apps/api/QUEUE.md.
 */

/** One BullMQ queue carries every engine job; `kind` says what its outcome is for. */
export const BULLMQ_QUEUE_NAME = "plumeline-engine";

export type EngineJobKind = "run" | "replay";

/** A job as published: the id of its row in the API's jobs table and the spec to run, gzip + base64. */
export interface EngineJobData {
  jobId: string;
  kind: EngineJobKind;
  /** gzip (RFC 1952) of the spec's JSON, base64: a 12-pathway spec shrinks several-fold. */
  specGz: string;
  /** sha256 of the spec's JSON as sent, so the worker can tell a damaged spec from a refused one. */
  specSha256: string;
}

/** What a worker returns: the result compressed, or the confirmation that it stopped on request. */
export type EngineJobReturn =
  | { kind: "done"; resultGz: string; jsonBytes: number; resultHash: string; contractWarning?: string }
  | { kind: "cancelled" };

/** Redis key that asks the workers to stop a job (set by the API; read by whichever worker holds it). */
export const cancelKey = (queueName: string, jobId: string): string => `plumeline:${queueName}:cancel:${jobId}`;

/** How long a cancel request stays in Redis: far longer than any run, short enough to clean itself up. */
export const CANCEL_KEY_TTL_SECONDS = 7 * 24 * 3600;

export function encodeSpec(spec: RunSpec): { specGz: string; specSha256: string } {
  const json = Buffer.from(JSON.stringify(spec), "utf8");
  return { specGz: gzipSync(json).toString("base64"), specSha256: createHash("sha256").update(json).digest("hex") };
}

export function decodeSpec(data: Pick<EngineJobData, "specGz" | "specSha256">): RunSpec {
  const json = gunzipSync(Buffer.from(data.specGz, "base64"));
  const sha = createHash("sha256").update(json).digest("hex");
  if (sha !== data.specSha256) throw new Error(`the job's spec is damaged (sha256 ${sha}, expected ${data.specSha256})`);
  return JSON.parse(json.toString("utf8")) as RunSpec;
}
