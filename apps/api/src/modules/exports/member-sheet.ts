import type ExcelJS from "exceljs";
import { MEMBER_SHEET_MAX_MEMBERS } from "@plumeline/contracts";

/** The member table for the workbook, or why it is not there. */
export type MemberSheet = { kind: "table"; columns: string[]; values: Float64Array[] } | { kind: "omitted"; reason: string };

const NOTE =
  "One row per member, recomputed from the run's stored spec (its engine version and result hash matched the stored run): " +
  "member number; each uncertain input's sampled value (units on the Inputs sheet; agent ids are forcing scale factors); " +
  "weight = the observational constraint's relative likelihood (largest 1; all 1 without a constraint; with a constraint and several pathways, weight@<pathwayId> per pathway, as each pathway is weighted by its own window warming); " +
  "then <pathwayId>@<year> = the member's warming in K at that horizon (pathway ids on the Manifest). " +
  "The Horizons sheet's percentiles are the R type 7 percentiles of these columns (weighted under a constraint). " +
  `Values in full precision; the sheet holds runs of up to ${MEMBER_SHEET_MAX_MEMBERS.toLocaleString("en-GB")} members, larger ones are in the members CSV.`;

/**
 * Adds the Members sheet: the note, the header, one row per member. Numbers keep the
 * spreadsheet's General format so every digit a validator needs is shown; member numbers as 0.
 */
export function addMemberSheet(workbook: ExcelJS.Workbook, sheet: MemberSheet, tag: string): void {
  const ws = workbook.addWorksheet("Members", { views: [{ state: "frozen", ySplit: 2 }] });
  if (sheet.kind === "omitted") {
    ws.addRow([`${tag}Member table left out of this workbook`]).font = { bold: true };
    ws.addRow([sheet.reason]);
    ws.getColumn(1).width = 120;
    return;
  }
  ws.addRow([`${tag}${NOTE}`]).font = { italic: true };
  ws.addRow(sheet.columns).font = { bold: true };
  const members = sheet.values[0]?.length ?? 0;
  const rows = Array.from({ length: members }, (_, m) => sheet.values.map((column) => column[m]!));
  ws.addRows(rows);
  ws.getColumn(1).numFmt = "0";
  sheet.columns.forEach((name, i) => (ws.getColumn(i + 1).width = Math.max(10, Math.min(40, name.length + 2))));
}
