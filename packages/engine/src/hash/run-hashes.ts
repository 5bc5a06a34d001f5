import type { RunResult, RunSpec } from "../spec/types.js";
import { canonicalHash } from "./sha256-hex.js";

/** inputHash: SHA-256 of the canonical JSON of the spec with every default applied. */
export function inputHash(spec: RunSpec): string {
  return canonicalHash(spec);
}

/** resultHash: SHA-256 of the canonical JSON of the result without its resultHash field. */
export function resultHash(result: RunResult): string {
  const { resultHash: _ignored, ...rest } = result;
  return canonicalHash(rest);
}
