import { createHash } from "node:crypto";
import canonicalizeModule from "canonicalize";

// The package is CommonJS with an ES-style default in its types; under NodeNext the default
// import is the module object, whose `default` is the function (at run time it may be either).
type Canonicalize = (input: unknown) => string | undefined;
const canonicalize: Canonicalize =
  (canonicalizeModule as unknown as { default?: Canonicalize }).default ?? (canonicalizeModule as unknown as Canonicalize);

/**
 * SHA-256 (hex) of the canonical JSON (RFC 8785, key order fixed) of a pathway's numbers:
 * `{ startYear, agents }`. Names and descriptions are left out on purpose: two pathways with the
 * same series share a checksum, so an export's manifest proves which numbers went in.
 */
export function pathwayChecksum(startYear: number, agents: unknown): string {
  const text = canonicalize({ startYear, agents });
  if (text === undefined) throw new TypeError("pathway series cannot be canonicalised");
  return createHash("sha256").update(text).digest("hex");
}
