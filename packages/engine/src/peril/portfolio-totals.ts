import type { PercentileSelector } from "../summary/percentile-selector.js";
import type { ProjectedFigures } from "./project-losses.js";
import { summariseValues } from "./summarise-values.js";
import type { PerilProfile, Portfolio, PortfolioRow, PortfolioTotal } from "./types.js";

/** Which profile projects each portfolio row, or why no totals can be formed. */
export interface TotalsPlan {
  /** Per row (portfolio order): index of the one profile projecting it, or -1 (row enters unchanged). */
  profileOfRow: number[];
  /** Currencies in order of first appearance; one total each, never added together. */
  currencies: string[];
}

/**
 * Plans the portfolio totals: each row is projected by the profile with the same peril and
 * region, or — with no such profile — enters the totals at its baseline figures unchanged.
 * A row two profiles would project has no single projected figure, so the totals are refused
 * with a message naming the row and both profiles (the per-profile tables still show both).
 * Cost O(rows × profiles).
 */
export function planPortfolioTotals(profiles: readonly PerilProfile[], portfolio: Portfolio): TotalsPlan | { refused: string } {
  const profileOfRow: number[] = [];
  for (const row of portfolio.rows) {
    const matches = profiles.flatMap((p, i) => (p.peril === row.peril && p.region === row.region ? [i] : []));
    if (matches.length > 1) {
      const names = matches.map((i) => `"${profiles[i]!.name}"`).join(" and ");
      return {
        refused: `portfolio row ${row.region} / ${row.peril} is projected by ${names}; a member's total needs one figure per row, so no portfolio totals are given`,
      };
    }
    profileOfRow.push(matches[0] ?? -1);
  }
  return { profileOfRow, currencies: [...new Set(portfolio.rows.map((r) => r.currency))] };
}

const MEASURES = ["aal", "loss100", "loss200"] as const;
type Measure = (typeof MEASURES)[number];

/**
 * Portfolio totals of one pathway, added up member by member.
 *
 * Method: for every member, its projected AAL, 1-in-100 and 1-in-200 loss of each row
 * (the lens's projection with that member's own multipliers of the row's profile) are added within the
 * row's currency; rows no profile projects add their baseline figures unchanged. Only then
 * are the members' totals summarised (weighted R-7 percentiles and weighted mean,
 * summariseValues), so the totals' percentiles are percentiles of a sum, never a sum of
 * percentiles. Adding tail losses within a member assumes the rows' tail events coincide
 * (no diversification between perils and regions): the tail totals are an upper-bound
 * style figure, not a portfolio return-period loss. Currencies are kept apart (one total
 * each); nothing is converted.
 * Memory O(currencies × horizons × 3 × members); cost O(rows × horizons × members).
 *
 * Example: two EUR severity rows (AAL 10 and 20) whose members have multipliers 1.1 and 1.2
 * → every member's AAL total is 10·1.1 + 20·1.2 = 35, so p50 = mean = 35.
 */
export class PortfolioTotalsAccumulator {
  /** sums[currency][horizon][measure] → per-member totals. */
  private readonly sums: Float64Array[][][];

  constructor(
    private readonly portfolio: Portfolio,
    private readonly plan: TotalsPlan,
    private readonly horizons: readonly number[],
    private readonly members: number,
  ) {
    this.sums = plan.currencies.map(() => horizons.map(() => MEASURES.map(() => new Float64Array(members))));
    // Rows no profile projects are the same for every member: their baseline figures.
    portfolio.rows.forEach((row, r) => {
      if (plan.profileOfRow[r] === -1) this.addConstant(row);
    });
  }

  private addConstant(row: PortfolioRow): void {
    const byHorizon = this.sums[this.plan.currencies.indexOf(row.currency)]!;
    for (const measures of byHorizon)
      MEASURES.forEach((key, k) => {
        const target = measures[k]!;
        for (let i = 0; i < this.members; i++) target[i] = target[i]! + row[key];
      });
  }

  /**
   * Adds, member by member, the projected figures of the rows profile `profileIndex` projects at
   * horizon h; `figuresOf(row, i)` gives member i's projected figures of a row (the lens's own
   * projection, so totals and per-row figures agree).
   */
  addProfile(profileIndex: number, h: number, figuresOf: (row: PortfolioRow, member: number) => ProjectedFigures): void {
    this.portfolio.rows.forEach((row, r) => {
      if (this.plan.profileOfRow[r] !== profileIndex) return;
      const [aal, loss100, loss200] = this.sums[this.plan.currencies.indexOf(row.currency)]![h]!;
      for (let i = 0; i < this.members; i++) {
        const f = figuresOf(row, i);
        aal![i] = aal![i]! + f.aal;
        loss100![i] = loss100![i]! + f.loss100;
        loss200![i] = loss200![i]! + f.loss200;
      }
    });
  }

  /** The totals, one per currency, summarised over members (weighted under a constraint). */
  summarise(weights: Float64Array | null, percentiles: readonly number[], selector: PercentileSelector): PortfolioTotal[] {
    return this.plan.currencies.map((currency, c) => {
      const rows = this.portfolio.rows.filter((row) => row.currency === currency);
      const projected = this.portfolio.rows.filter((row, r) => row.currency === currency && this.plan.profileOfRow[r] !== -1).length;
      const baseline = Object.fromEntries(MEASURES.map((key) => [key, rows.reduce((s, row) => s + row[key], 0)])) as Record<Measure, number>;
      return {
        currency,
        rows: rows.length,
        projectedRows: projected,
        baseline,
        horizons: this.horizons.map((year, h) => {
          const [aal, loss100, loss200] = this.sums[c]![h]!;
          return {
            year,
            aal: summariseValues(aal!, weights, percentiles, selector),
            loss100: summariseValues(loss100!, weights, percentiles, selector),
            loss200: summariseValues(loss200!, weights, percentiles, selector),
          };
        }),
      };
    });
  }
}
