import { z } from "zod";

/** Field rules the peril profile and the portfolio share, so both name the same problems the same way. */

export const finite = () => z.number({ error: "must be a number" }).refine(Number.isFinite, "must be finite");

export const slug = (example: string) =>
  z
    .string({ error: "must be text" })
    .trim()
    .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, `must be a lower-case slug like "${example}"`);
export const label = () =>
  z.string({ error: "must be text" }).trim().min(1, "must not be empty").max(120, "must be at most 120 characters");
