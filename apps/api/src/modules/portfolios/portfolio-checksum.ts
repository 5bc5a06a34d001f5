import type { PortfolioRow } from "@plumeline/contracts";
import { canonicalHash } from "@plumeline/engine";

/**
 * SHA-256 (hex) of the canonical JSON (RFC 8785) of a portfolio's rows, in file order. The
 * name and description are left out: two uploads of the same figures share a checksum, so an
 * export proves which baseline went into a run. The hashing itself is the engine's
 * `canonicalHash`, the one implementation of canonical JSON.
 */
export function portfolioChecksum(rows: readonly PortfolioRow[]): string {
  return canonicalHash(rows.map((r) => ({ region: r.region, peril: r.peril, currency: r.currency, aal: r.aal, loss100: r.loss100, loss200: r.loss200 })));
}
