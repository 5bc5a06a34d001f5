import { gunzipSync, gzipSync } from "node:zlib";
import type { RunResult } from "@plumeline/contracts";

/** The one encoding results are stored and carried in: gzip (RFC 1952) of the RunResult as UTF-8 JSON. */
export const RESULT_ENCODING = "gzip-json";

export interface ResultDocument {
  document: Buffer;
  jsonBytes: number;
}

/**
 * Compresses a result for storage or for the trip back through the queue. gzip rather than
 * brotli: at the default level it is several times faster to write for a similar size on these
 * number-heavy documents, and every HTTP client accepts it, so the stored bytes can be served
 * as they are.
 */
export function compressResult(result: RunResult): ResultDocument {
  const json = Buffer.from(JSON.stringify(result), "utf8");
  return { document: gzipSync(json), jsonBytes: json.length };
}

export function decompressResult(document: Buffer): RunResult {
  return JSON.parse(gunzipSync(document).toString("utf8")) as RunResult;
}
