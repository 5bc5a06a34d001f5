import { createHash } from "node:crypto";
import type { PortfolioRow } from "@plumeline/contracts";
import canonicalizeModule from "canonicalize";

// CommonJS package with an ES-style default in its types (see pathways/pathway-checksum.ts).
type Canonicalize = (input: unknown) => string | undefined;
const canonicalize: Canonicalize =
  (canonicalizeModule as unknown as { default?: Canonicalize }).default ?? (canonicalizeModule as unknown as Canonicalize);

/**
 * SHA-256 (hex) of the canonical JSON (RFC 8785) of a portfolio's rows, in file order. The
 * name and description are left out: two uploads of the same figures share a checksum, so an
 * export proves which baseline went into a run.
 */
export function portfolioChecksum(rows: readonly PortfolioRow[]): string {
  const text = canonicalize(rows.map((r) => ({ region: r.region, peril: r.peril, currency: r.currency, aal: r.aal, loss100: r.loss100, loss200: r.loss200 })));
  if (text === undefined) throw new TypeError("portfolio rows cannot be canonicalised");
  return createHash("sha256").update(text).digest("hex");
}
