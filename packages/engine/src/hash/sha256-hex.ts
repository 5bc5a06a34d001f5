import canonicalizeModule from "canonicalize";
import { sha256 } from "@noble/hashes/sha2";
import { bytesToHex, utf8ToBytes } from "@noble/hashes/utils";

/**
 * SHA-256 (FIPS 180-4) of the canonical JSON of a value (RFC 8785 JSON Canonicalization
 * Scheme via the `canonicalize` package: sorted keys, no whitespace, numbers printed the
 * ECMAScript way), as lowercase hex. Numbers are hashed exactly as computed, without
 * rounding: RFC 8785 prints the shortest text that round-trips a double, and V8 computes
 * Math.exp/log with its own portable routines, so the same engine version on the same
 * Node major gives the same text on every platform. Cost O(size of the JSON).
 *
 * Example: canonicalHash({ b: 1, a: [2] }) hashes the text '{"a":[2],"b":1}'.
 */
// The package is CommonJS with an ESM-style type declaration: take the function either way.
type Canonicalize = (input: unknown) => string | undefined;
const canonicalize: Canonicalize =
  (canonicalizeModule as unknown as { default?: Canonicalize }).default ?? (canonicalizeModule as unknown as Canonicalize);

export function canonicalHash(value: unknown): string {
  const text = canonicalize(value);
  if (text === undefined) throw new RangeError("value cannot be written as JSON");
  return bytesToHex(sha256(utf8ToBytes(text)));
}
