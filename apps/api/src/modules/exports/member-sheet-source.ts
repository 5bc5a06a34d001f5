import { MEMBER_SHEET_MAX_MEMBERS, MEMBER_TABLE, type RunResult, type RunSpec } from "@plumeline/contracts";
import { AppError } from "../../errors/app-error.js";
import { MEMBER_CSV_CHUNK_MEMBERS, openMemberTable, type OpenMemberTable } from "./member-table-client.js";
import type { MemberSheet } from "./member-sheet.js";

/**
 * The workbook's Members sheet: the table when the run has at most MEMBER_SHEET_MAX_MEMBERS
 * members and recomputes to its stored engine version and result hash; otherwise why it was
 * left out and where the table is. Same stored run, same engine → same sheet, so a workbook
 * downloaded again rebuilds to the same bytes.
 */
export async function memberSheetOf(runId: string, spec: RunSpec, result: Pick<RunResult, "engineVersion" | "resultHash">): Promise<MemberSheet> {
  const csv = `the CSV export (GET /api/runs/${runId}/tables/${MEMBER_TABLE}.csv, also on the run's Export panel)`;
  if (spec.members > MEMBER_SHEET_MAX_MEMBERS)
    return {
      kind: "omitted",
      reason: `This run has ${spec.members.toLocaleString("en-GB")} members, more than the ${MEMBER_SHEET_MAX_MEMBERS.toLocaleString("en-GB")} this workbook holds on a sheet: the member table is in ${csv}.`,
    };
  let table: OpenMemberTable | null = null;
  try {
    table = await openMemberTable({
      spec,
      expected: { engineVersion: result.engineVersion, resultHash: result.resultHash },
      columnsUpTo: MEMBER_SHEET_MAX_MEMBERS,
      chunkMembers: MEMBER_CSV_CHUNK_MEMBERS,
    });
    return { kind: "table", columns: table.columns, values: table.values! };
  } catch (error) {
    if (error instanceof AppError) return { kind: "omitted", reason: `No member table: ${error.message}` };
    throw error;
  } finally {
    await table?.close();
  }
}
