import { z } from "zod";
import currencyCodes from "currency-codes";
import { finite, label, slug } from "./peril-fields.js";

/** ISO 4217 codes (currency-codes package), less XTS (testing) and XXX (no currency). */
export const CURRENCY_CODES: readonly string[] = currencyCodes.codes().filter((c) => c !== "XTS" && c !== "XXX");
const currencySet = new Set(CURRENCY_CODES);

const money = () => finite().refine((v) => v >= 0, "must not be negative");

/**
 * One line of a portfolio baseline: the firm's own figures for a region and peril, from
 * its catastrophe model or experience, in one currency. Losses per year (AAL) and at the
 * 1-in-100 and 1-in-200 annual return periods.
 */
export const portfolioRowSchema = z
  .object({
    region: label(),
    peril: slug("flood-heavy-rainfall"),
    currency: z
      .string({ error: "must be text" })
      .trim()
      .refine((c) => currencySet.has(c), "must be an ISO 4217 currency code in capitals, such as EUR"),
    aal: money(),
    loss100: money(),
    loss200: money(),
  })
  .strict()
  .superRefine((r, ctx) => {
    if (r.loss200 < r.loss100)
      ctx.addIssue({
        code: "custom",
        path: ["loss200"],
        message: `must be at least loss100 (${r.loss100}): a 1-in-200 loss cannot be below the 1-in-100 loss`,
      });
  });

/** Rows of a portfolio: each (region, peril) once. Issues name the row index and field. */
export const portfolioRowsSchema = z
  .array(portfolioRowSchema, { error: "must be a list of rows" })
  .min(1, "must hold at least one row")
  .superRefine((rows, ctx) => {
    const seen = new Map<string, number>();
    rows.forEach((r, i) => {
      const key = `${r.region}\u0000${r.peril}`;
      const first = seen.get(key);
      if (first !== undefined)
        ctx.addIssue({
          code: "custom",
          path: [i, "region"],
          message: `repeats region "${r.region}" with peril "${r.peril}", already given in rows[${first}]`,
        });
      else seen.set(key, i);
    });
  });

export const portfolioSchema = z
  .object({
    id: z.string({ error: "must be text" }).trim().min(1, "must not be empty").max(64, "must be at most 64 characters"),
    name: label(),
    rows: portfolioRowsSchema,
  })
  .strict();

export type PortfolioRow = z.output<typeof portfolioRowSchema>;
export type Portfolio = z.output<typeof portfolioSchema>;
