import { Op, type WhereOptions } from "sequelize";

const BARE_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** A bare date means the whole day in UTC: `from` at its first instant ... */
export function startOfDay(value: string): Date {
  return new Date(BARE_DATE.test(value) ? `${value}T00:00:00.000Z` : value);
}
/** ... and `to` at its last, so `from=to=2026-12-05` is that one day. */
export function endOfDay(value: string): Date {
  return new Date(BARE_DATE.test(value) ? `${value}T23:59:59.999Z` : value);
}

/** Inclusive createdAt range from optional ISO `from` / `to` (already validated). */
export function createdBetween(range: { from?: string | undefined; to?: string | undefined }, attribute = "createdAt"): WhereOptions[] {
  const bounds: Record<symbol, Date> = {};
  if (range.from) bounds[Op.gte] = startOfDay(range.from);
  if (range.to) bounds[Op.lte] = endOfDay(range.to);
  return range.from || range.to ? [{ [attribute]: bounds }] : [];
}
