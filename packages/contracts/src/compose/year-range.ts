import { ComposeStepError } from "./compose-step-error.js";
import { lastYear, type PathwayData } from "./pathway-data.js";

/**
 * Checks that fromYear–toYear (inclusive) lies inside the pathway's years and runs forwards;
 * returns the first and last index it covers. Each refusal names the field and the years.
 */
export function yearRangeIndexes(
  p: PathwayData,
  fromYear: number,
  toYear: number,
  fields = { from: "fromYear", to: "toYear" },
): [number, number] {
  const last = lastYear(p);
  if (fromYear < p.startYear || fromYear > last)
    throw new ComposeStepError(fields.from, `${fromYear} lies outside the pathway's years ${p.startYear}–${last}`);
  if (toYear < p.startYear || toYear > last)
    throw new ComposeStepError(fields.to, `${toYear} lies outside the pathway's years ${p.startYear}–${last}`);
  if (toYear < fromYear) throw new ComposeStepError(fields.to, `${toYear} comes before ${fields.from} ${fromYear}`);
  return [fromYear - p.startYear, toYear - p.startYear];
}
