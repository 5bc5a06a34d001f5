/**
 * Peril lens shapes as the engine sees them. They mirror the shared contracts
 * (packages/contracts/src/engine/peril-profile.ts, peril-portfolio.ts and peril-result.ts)
 * field for field; the engine library imports nothing of ours, so they are restated here.
 * The rules they follow are written out in the contracts' profile file and in PERIL_RULES there.
 */
import type { Distribution } from "../distributions/types.js";

export type PerilMetric = "frequency" | "severity";

/** multiplier = (1 + r)^(ΔT − ΔT0), r a fraction per K (0.07 = 7 %/K), r > −1. */
export interface PerKelvinScaling {
  kind: "per-kelvin";
  rate: Distribution;
}

/** A point of a scaling table: the metric at a global warming level (K above 1850–1900). */
export interface TablePoint {
  warming: number;
  multiplier: number;
}

/** Multipliers by warming level for events of one return period (years). */
export interface ReturnPeriodTable {
  returnPeriod: number;
  points: TablePoint[];
}

/**
 * Multipliers by warming level, one table per event return period (return periods strictly
 * increasing), relative to any fixed reference; the lens divides by the value at the baseline
 * warming. "hold" keeps the end value beyond a table's warming levels, "extrapolate" continues
 * the end segment's per-kelvin (geometric) rate. Between return periods: log multiplier linear
 * in log return period; beyond them `beyondReturnPeriods` (default "hold") holds the nearest
 * table or continues the end segment's power law.
 * A spec stored before return periods were stated carries `points` instead of `tables`: it is
 * read as one table for 10-year events (LEGACY_TABLE_RETURN_PERIOD).
 */
export interface TableScaling {
  kind: "table";
  tables?: ReturnPeriodTable[];
  /** Superseded by `tables` (older specs). */
  points?: TablePoint[];
  beyondTable: "hold" | "extrapolate";
  beyondReturnPeriods?: "hold" | "extrapolate";
}

export type PerilScaling = PerKelvinScaling | TableScaling;

export interface PerilProfile {
  id: string;
  name: string;
  /** Lower-case slug: "flood-heavy-rainfall", "heat", "wind", … */
  peril: string;
  region: string;
  metric: PerilMetric;
  /** Warming already in the firm's risk view, K above 1850–1900 (0–3). */
  baselineWarming: number;
  scaling: PerilScaling;
  source?: string;
}

/** The firm's baseline figures for one region and peril, in one currency. */
export interface PortfolioRow {
  region: string;
  peril: string;
  currency: string;
  aal: number;
  loss100: number;
  loss200: number;
}

export interface Portfolio {
  id: string;
  name: string;
  rows: PortfolioRow[];
}

/** Requested percentiles ("p5", …) and the (weighted) mean of one uncertain output. */
export type PerilSummary = Record<string, number>;

export interface ProjectedLoss {
  region: string;
  peril: string;
  currency: string;
  aal: PerilSummary;
  loss100: PerilSummary;
  loss200: PerilSummary;
}

/** Share of members (weighted, 0–1) whose warming lies below / above a table's warming range. */
export interface BeyondTableShare {
  below: number;
  above: number;
}

export interface PerilHorizonResult {
  year: number;
  /** The multiplier AAL uses: for a table profile, that of its most frequent table. */
  multiplier: PerilSummary;
  /** Multipliers of today's 1-in-100 and 1-in-200 events (always written; optional, like beyondTable and
   *  multiplierReturnPeriod, because stored results of earlier engines lack them). */
  tailMultipliers?: { "100": PerilSummary; "200": PerilSummary };
  /** Table profiles: members beyond the warming range every table covers; null for per-kelvin. */
  beyondTable?: BeyondTableShare | null;
  /** Frequency profiles: return period of today's 1-in-100 and 1-in-200 events; null for severity. */
  returnPeriods: { "100": PerilSummary; "200": PerilSummary } | null;
  losses: ProjectedLoss[];
}

export interface PerilProfileResult {
  profileId: string;
  name: string;
  peril: string;
  region: string;
  metric: PerilMetric;
  baselineWarming: number;
  /**
   * Table profiles: their return periods, the warming range every table covers, the rules beyond them, and the reported return periods read outside the tables.
   * This engine always writes it (null for per-kelvin profiles); optional because stored results of earlier engines lack it.
   */
  table?: {
    returnPeriods: number[];
    warmingRange: [number, number];
    beyondTable: "hold" | "extrapolate";
    beyondReturnPeriods: "hold" | "extrapolate";
    readOutside: number[];
  } | null;
  /** Return period whose multiplier `multiplier` and AAL use; null when one multiplier serves every return period. */
  multiplierReturnPeriod?: number | null;
  horizons: PerilHorizonResult[];
}

/** Portfolio figures in one currency: the sum of its rows' baseline figures. */
export interface PortfolioFigures {
  aal: number;
  loss100: number;
  loss200: number;
}

/**
 * The portfolio's totals in one currency at each horizon, added member by member over all
 * its rows (portfolio-totals.ts), then summarised. `baseline` is today's total (the rows as
 * given), so the change of any percentile against today is that percentile minus it.
 */
export interface PortfolioTotal {
  currency: string;
  /** Rows in this currency, and how many of them a profile projected (the rest enter unchanged). */
  rows: number;
  projectedRows: number;
  baseline: PortfolioFigures;
  horizons: { year: number; aal: PerilSummary; loss100: PerilSummary; loss200: PerilSummary }[];
}

export interface PathwayPerilResult {
  pathwayId: string;
  profiles: PerilProfileResult[];
  /** With a portfolio: its totals, one per currency; absent without a portfolio or when refused (PerilResult.totalsRefused). */
  totals?: PortfolioTotal[];
}

export interface PerilResult {
  portfolioId: string | null;
  pathways: PathwayPerilResult[];
  unmatchedRows: { region: string; peril: string }[];
  /** Why the portfolio has no totals (a row projected by two profiles); absent otherwise. */
  totalsRefused?: string;
}
