import type { RunResult } from "@plumeline/contracts";
import { beyondTableWarning } from "./peril-result-tables.js";

/**
 * The peril lens's warnings for one run, as sentences for the workbook's cautions: every
 * pathway, profile and horizon where more than 5 % of members lie beyond a table's warming
 * range, and every table profile whose 1-in-100 or 1-in-200 figures are read beyond its
 * tables' return periods. Older results without these fields give none.
 */
export function perilWarnings(result: RunResult): string[] {
  const names = new Map(result.pathways.map((p) => [p.id, p.name]));
  const out: string[] = [];
  const seenOutside = new Set<string>();
  for (const pathway of result.perils?.pathways ?? [])
    for (const profile of pathway.profiles) {
      const outside = profile.table?.readOutside ?? [];
      if (outside.length > 0 && !seenOutside.has(profile.profileId)) {
        seenOutside.add(profile.profileId);
        const periods = profile.table!.returnPeriods;
        out.push(
          `${profile.name}: the tables are for ${periods.join(" and ")}-year events, so the 1-in-${outside.join(" and 1-in-")} figures are read beyond them (${profile.table!.beyondReturnPeriods === "hold" ? "the nearest table held" : "the end segment extrapolated"}).`,
        );
      }
      for (const h of profile.horizons) {
        const warning = beyondTableWarning(h.beyondTable, profile);
        if (warning) out.push(`${profile.name}, ${names.get(pathway.pathwayId) ?? pathway.pathwayId}, ${h.year}: ${warning}.`);
      }
    }
  return out;
}
