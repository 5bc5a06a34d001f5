import type { RunSpec } from "@plumeline/contracts";

/** What the member-table thread is asked (workerData): recompute this stored run's members. */
export interface MemberTableRequest {
  spec: RunSpec;
  /** The stored run's engineVersion and resultHash: the recomputation must give them back. */
  expected: { engineVersion: string; resultHash: string };
  /** Send the columns themselves too (for a workbook sheet) when the run has at most this many members. */
  columnsUpTo: number;
  /** Members per CSV chunk. */
  chunkMembers: number;
}

export type FromMemberTableThread =
  | { type: "ready"; members: number; columns: string[]; values: Float64Array[] | null }
  | { type: "refused"; code: "engine_version_mismatch" | "result_hash_mismatch"; message: string }
  | { type: "failed"; message: string }
  | { type: "chunk"; bytes: Uint8Array }
  | { type: "end" };

/** The server asks for the next CSV chunk only when it has written the last one (backpressure). */
export type ToMemberTableThread = { type: "next" };
