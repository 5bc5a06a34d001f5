import { checkTable, tableMultiplierAt } from "./table-multiplier.js";
import type { ReturnPeriodTable, TableScaling } from "./types.js";

/** Return period read for a table stored before tables stated one (a bare `points` list), years. */
export const LEGACY_TABLE_RETURN_PERIOD = 10;

/**
 * The tables of a table scaling, oldest form included: a bare `points` list is one table for
 * LEGACY_TABLE_RETURN_PERIOD-year events. Throws a RangeError naming the field when there is
 * no table, a return period is not a finite number ≥ 1, or return periods do not strictly
 * increase (the tables' points are checked by checkTable).
 */
export function tablesOf(scaling: Pick<TableScaling, "tables" | "points">): ReturnPeriodTable[] {
  if (scaling.tables === undefined && Array.isArray(scaling.points)) return [{ returnPeriod: LEGACY_TABLE_RETURN_PERIOD, points: scaling.points }];
  if (!Array.isArray(scaling.tables) || scaling.tables.length === 0) throw new RangeError("tables must hold at least one table");
  scaling.tables.forEach((t, i) => {
    if (typeof t.returnPeriod !== "number" || !Number.isFinite(t.returnPeriod) || t.returnPeriod < 1)
      throw new RangeError(`tables[${i}].returnPeriod must be a finite number of years ≥ 1`);
    if (i > 0 && !(t.returnPeriod > scaling.tables![i - 1]!.returnPeriod))
      throw new RangeError(`tables[${i}].returnPeriod must be greater than tables[${i - 1}].returnPeriod: return periods must strictly increase`);
    try {
      checkTable(t.points, "hold");
    } catch (error) {
      throw new RangeError(`tables[${i}].${(error as Error).message}`, { cause: error });
    }
  });
  return scaling.tables;
}

export interface TableProfileReader {
  /** The tables' return periods, ascending (years). */
  returnPeriods: number[];
  /** Warming range (K above 1850–1900) that every table covers: the largest first level to the smallest last level. */
  warmingRange: [number, number];
  /** Fills `out[k]` with table k's multiplier at `warming` (its value there over its value at the baseline warming). */
  multipliersAt(warming: number, out: Float64Array): void;
}

/**
 * One reader for a table profile, each table checked once: per table the multiplier relative
 * to the baseline risk view (tableMultiplierAt), and the warming range all tables cover, so
 * the lens can count members beyond it. Cost O(points) to build and per call.
 *
 * Example: tables 10-yr [(0,1),(1,2.8)] and 50-yr [(0,1),(1,4.8)], baseline 0, warming 1 →
 * multipliers [2.8, 4.8], warmingRange [0, 1].
 */
export function tableProfileReader(scaling: TableScaling, baselineWarming: number): TableProfileReader {
  const tables = tablesOf(scaling);
  const readers = tables.map((t) => tableMultiplierAt(t.points, scaling.beyondTable, baselineWarming));
  const low = Math.max(...tables.map((t) => t.points[0]!.warming));
  const high = Math.min(...tables.map((t) => t.points[t.points.length - 1]!.warming));
  return {
    returnPeriods: tables.map((t) => t.returnPeriod),
    warmingRange: [low, high],
    multipliersAt(warming, out) {
      for (let k = 0; k < readers.length; k++) out[k] = readers[k]!(warming);
    },
  };
}
