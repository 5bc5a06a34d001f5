import { z } from "zod";

/**
 * Resource limits of one run and one pathway, shared by the API, the web forms and the engine
 * CLI (the engine library keeps the same numbers in packages/engine/src/spec/limits.ts; an API test,
 * limits-agree.test.ts, holds the two equal).
 * WHY: each threshold, horizon and percentile multiplies engine work, stored result rows and
 * workbook columns; a run with 17,000 thresholds once held the database for minutes.
 */
export const MAX_THRESHOLDS = 20;
export const MAX_HORIZONS = 20;
export const MAX_PERCENTILES = 25;
export const MAX_PATHWAYS_PER_RUN = 12;
/** Plausible calendar years for pathways and horizons: a typo like 1e15 is refused. */
export const MIN_YEAR = 1000;
export const MAX_YEAR = 3000;

/** A whole year from MIN_YEAR to MAX_YEAR. */
export const plausibleYear = () =>
  z
    .number({ error: "must be a year" })
    .int("must be a whole year")
    .refine((y) => y >= MIN_YEAR && y <= MAX_YEAR, `must be a year from ${MIN_YEAR} to ${MAX_YEAR}`);

/**
 * A list of at most `max` values with no value twice; a repeat is named by its position and
 * the first one's, so `[2030, 2050, 2030]` reads "horizons[2] repeats 2030 (already horizons[0])".
 */
export function boundedUniqueList<T extends z.ZodType<number>>(item: T, max: number, field: string) {
  return z
    .array(item, { error: "must be a list of numbers" })
    .max(max, `must list at most ${max} values (the limit per run)`)
    .superRefine((list, ctx) => {
      const first = new Map<number, number>();
      list.forEach((value, i) => {
        const earlier = first.get(value);
        if (earlier === undefined) first.set(value, i);
        else ctx.addIssue({ code: "custom", path: [i], message: `repeats ${value} (already ${field}[${earlier}])` });
      });
    });
}
