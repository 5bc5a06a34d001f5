import { canonicalHash } from "@plumeline/engine";

/**
 * SHA-256 (hex) of the canonical JSON (RFC 8785, key order fixed) of a pathway's numbers:
 * `{ startYear, agents }`. Names and descriptions are left out on purpose: two pathways with the
 * same series share a checksum, so an export's manifest proves which numbers went in. The
 * hashing itself is the engine's `canonicalHash`, the one implementation of canonical JSON.
 */
export function pathwayChecksum(startYear: number, agents: unknown): string {
  return canonicalHash({ startYear, agents });
}
