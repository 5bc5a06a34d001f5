import { z } from "zod";
import { PERIL_METRICS } from "@plumeline/contracts";
import { RATE_PARAMS, type ProfileDraft, type RateType } from "./profile-draft";

const text = z.string();
const hold = z.enum(["hold", "extrapolate"]);

/**
 * The peril-profile editor's draft as kept in the browser: text as typed, choices from the same
 * lists the API accepts (metrics from the contracts, rate types from the editor's own table).
 */
export const storedProfileDraftSchema: z.ZodType<ProfileDraft> = z.object({
  name: text,
  peril: text,
  region: text,
  metric: z.enum(PERIL_METRICS),
  baselineWarming: text,
  source: text,
  kind: z.enum(["per-kelvin", "table"]),
  rateType: z.enum(Object.keys(RATE_PARAMS) as [RateType, ...RateType[]]),
  rate: z.record(z.string(), text),
  coverage: z.enum(["90", "66"]),
  shape: z.enum(["lognormal", "split-normal"]),
  tables: z.array(z.object({ returnPeriod: text, points: z.array(z.object({ warming: text, multiplier: text }).strict()) }).strict()),
  beyondTable: hold,
  beyondReturnPeriods: hold,
});
