import { validateDistribution, quantileOf } from "../distributions/index.js";
import { SpecError } from "../spec/spec-error.js";
import { checkTable } from "./table-multiplier.js";
import { tablesOf } from "./table-profile.js";
import type { PerilProfile, Portfolio } from "./types.js";

/** Limits the contracts state too (packages/contracts/src/engine/peril-profile.ts). */
export const BASELINE_WARMING_RANGE = [0, 3] as const;
/** Rates are checked at these tail probabilities: P(r ≤ −1) must be below 1e-9. */
const RATE_TAIL_PROBABILITY = 1e-9;

/**
 * The engine's own guard for the peril part of a spec (the contracts schema runs first in
 * the CLI and API). Throws the first problem as a SpecError naming the field, e.g.
 * "perils[0].baselineWarming must lie between 0 and 3 K …" or "portfolio.rows[2].loss200 …".
 * Currency: three capital letters here; the ISO 4217 list itself is checked by contracts.
 * Cost O(profiles + rows + table points).
 */
export function validatePerilInputs(
  perils: readonly PerilProfile[] | undefined,
  portfolio: Portfolio | null | undefined,
  baseline: readonly [number, number],
): void {
  const profiles = perils ?? [];
  // Checked as `unknown`: Array.isArray on the typed list would narrow it to any[].
  const list: unknown = profiles;
  if (!Array.isArray(list)) throw new SpecError("perils", "must be a list of peril profiles");
  if (profiles.length > 0 && (baseline[0] !== 1850 || baseline[1] !== 1900))
    throw new SpecError("baseline", "must be [1850, 1900] when perils are given (peril warming levels are measured against 1850–1900)");
  const ids = new Set<string>();
  profiles.forEach((profile, i) => {
    const at = `perils[${i}]`;
    if (typeof profile.id !== "string" || profile.id.length === 0) throw new SpecError(`${at}.id`, "must not be empty");
    if (ids.has(profile.id)) throw new SpecError(`${at}.id`, `"${profile.id}" is used twice`);
    ids.add(profile.id);
    for (const key of ["name", "peril", "region"] as const)
      if (typeof profile[key] !== "string" || profile[key].length === 0) throw new SpecError(`${at}.${key}`, "must not be empty");
    if (profile.metric !== "frequency" && profile.metric !== "severity")
      throw new SpecError(`${at}.metric`, 'must be "frequency" or "severity"');
    const b = profile.baselineWarming;
    if (typeof b !== "number" || !(b >= BASELINE_WARMING_RANGE[0] && b <= BASELINE_WARMING_RANGE[1]))
      throw new SpecError(`${at}.baselineWarming`, "must lie between 0 and 3 K (warming above 1850–1900 already in the risk view)");
    validateScaling(profile, `${at}.scaling`);
  });
  if (portfolio === null || portfolio === undefined) return;
  if (profiles.length === 0) throw new SpecError("portfolio", "needs at least one peril profile in perils to be projected");
  validatePortfolio(portfolio);
}

function validateScaling(profile: PerilProfile, at: string): void {
  const scaling = profile.scaling;
  if (scaling?.kind === "per-kelvin") {
    const field = `${at}.rate`;
    try {
      validateDistribution(scaling.rate, field);
    } catch (error) {
      throw asSpecError(error, field);
    }
    const low = quantileOf(scaling.rate, RATE_TAIL_PROBABILITY);
    if (!(low > -1))
      throw new SpecError(field, `lets the rate reach -100 % per K or less (its 1e-9 quantile is ${low}); rates must stay above -1`);
    return;
  }
  if (scaling?.kind === "table") {
    try {
      tablesOf(scaling).forEach((t) => checkTable(t.points, scaling.beyondTable));
    } catch (error) {
      throw asSpecError(new RangeError(`${at}.${(error as Error).message}`), at);
    }
    const beyond = scaling.beyondReturnPeriods;
    if (beyond !== undefined && beyond !== "hold" && beyond !== "extrapolate")
      throw new SpecError(`${at}.beyondReturnPeriods`, 'must be "hold" or "extrapolate"');
    return;
  }
  throw new SpecError(`${at}.kind`, 'must be "per-kelvin" or "table"');
}

function validatePortfolio(portfolio: Portfolio): void {
  if (!Array.isArray(portfolio.rows) || portfolio.rows.length === 0) throw new SpecError("portfolio.rows", "must hold at least one row");
  const seen = new Map<string, number>();
  portfolio.rows.forEach((row, i) => {
    const at = `portfolio.rows[${i}]`;
    for (const key of ["region", "peril"] as const)
      if (typeof row[key] !== "string" || row[key].length === 0) throw new SpecError(`${at}.${key}`, "must not be empty");
    if (typeof row.currency !== "string" || !/^[A-Z]{3}$/.test(row.currency))
      throw new SpecError(`${at}.currency`, "must be an ISO 4217 currency code in capitals, such as EUR");
    for (const key of ["aal", "loss100", "loss200"] as const) {
      const v = row[key];
      if (typeof v !== "number" || !Number.isFinite(v)) throw new SpecError(`${at}.${key}`, "must be a finite number");
      if (v < 0) throw new SpecError(`${at}.${key}`, "must not be negative");
    }
    if (row.loss200 < row.loss100)
      throw new SpecError(`${at}.loss200`, `must be at least loss100 (${row.loss100}): a 1-in-200 loss cannot be below the 1-in-100 loss`);
    const key = `${row.region}\u0000${row.peril}`;
    const first = seen.get(key);
    if (first !== undefined)
      throw new SpecError(`${at}.region`, `repeats region "${row.region}" with peril "${row.peril}", already given in portfolio.rows[${first}]`);
    seen.set(key, i);
  });
}

/** A RangeError "<field> <problem>" from a checker, as the SpecError for that field. */
function asSpecError(error: unknown, fallbackField: string): SpecError {
  const message = error instanceof Error ? error.message : String(error);
  const space = message.indexOf(" ");
  return space > 0 ? new SpecError(message.slice(0, space), message.slice(space + 1)) : new SpecError(fallbackField, message);
}
