import type { PerilCurve, PerilProfileRecord, PortfolioSummary } from "@plumeline/contracts";

/**
 * Hand-made API records in the shapes the contracts parse (not engine output), for tests
 * that answer the peril-lens calls through the fetch stub.
 */
export function perilProfileRecord(over: Partial<PerilProfileRecord> = {}): PerilProfileRecord {
  return {
    id: "pp-1",
    name: "Flood, Northmere",
    peril: "flood-heavy-rainfall",
    region: "Northmere Coast",
    metric: "severity",
    baselineWarming: 1.1,
    scaling: { kind: "per-kelvin", rate: { type: "fixed", value: 0.07 } },
    locked: false,
    lockedBy: { modelVersions: [], runIds: [] },
    copiedFrom: null,
    createdBy: "u-actuary",
    createdByName: "Ada Actuary",
    createdAt: "2025-03-01T09:00:00.000Z",
    updatedAt: "2025-03-01T09:00:00.000Z",
    ...over,
  };
}

export function portfolioSummary(over: Partial<PortfolioSummary> = {}): PortfolioSummary {
  return {
    id: "pf-1",
    name: "Harbourline property baseline",
    description: "",
    rowCount: 2,
    regions: ["Northmere Coast"],
    perils: ["flood-heavy-rainfall", "hail"],
    currencies: ["EUR"],
    checksum: "a".repeat(64),
    fileName: "baseline.csv",
    createdBy: "u-actuary",
    createdByName: "Ada Actuary",
    createdAt: "2025-03-01T09:00:00.000Z",
    ...over,
  };
}

/** A fixed 7 %/K curve at three warming levels: (1.07)^(ΔT − 1.1), so the preview has something to draw. */
export function flatRateCurve(): PerilCurve {
  const warming = [1, 2, 3];
  const band = warming.map((w) => 1.07 ** (w - 1.1));
  return { warming, bands: { p5: band, p17: band, p50: band, p83: band, p95: band }, percentiles: [5, 17, 50, 83, 95], baselineWarming: 1.1, metric: "severity" };
}

/** The API's error body (docs/API.md: one error shape for every failure). */
export const apiError = (status: number, code: string, message: string, details: Array<{ path: string; message: string }> = []) => ({
  status,
  body: { error: { code, message, details } },
});
