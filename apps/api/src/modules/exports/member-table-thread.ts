/**
 * Worker thread that recomputes a stored run's member table off the server's event loop.
 * Same spec + seed + engine version give the same members (the engine is deterministic), so
 * it first checks the engine version, then reruns the ensemble and checks its resultHash
 * against the stored one — only then is the table offered, so every row is a member of the
 * run the validator is looking at. The CSV goes out in chunks, one per request of the server.
 */
import { parentPort, workerData } from "node:worker_threads";
import { engineVersion, memberTable, memberTableCsv, runEnsemble, type MemberTable } from "@plumeline/engine";
import { neutraliseFormula } from "./neutralise-formula.js";
import type { FromMemberTableThread, MemberTableRequest, ToMemberTableThread } from "./member-table-protocol.js";

if (!parentPort) throw new Error("member-table-thread.ts must run as a worker thread");
const port = parentPort;
const post = (message: FromMemberTableThread, transfer: ArrayBuffer[] = []) => port.postMessage(message, transfer);

function prepare(request: MemberTableRequest): MemberTable | null {
  const { spec, expected } = request;
  if (expected.engineVersion !== engineVersion) {
    post({
      type: "refused",
      code: "engine_version_mismatch",
      message: `The run was made with engine ${expected.engineVersion}; this server runs engine ${engineVersion}, whose members differ. Replay the run on this engine to export its member table.`,
    });
    return null;
  }
  const rerun = runEnsemble(spec);
  if (rerun.resultHash !== expected.resultHash) {
    post({
      type: "refused",
      code: "result_hash_mismatch",
      message: `Recomputing the run gave result hash ${rerun.resultHash}, not the stored ${expected.resultHash}: its members cannot be reproduced here, so no member table is offered.`,
    });
    return null;
  }
  const table = memberTable(spec);
  // Column names carry pathway ids and input names: neutralised like every other export's text.
  return { columns: table.columns.map(neutraliseFormula), values: table.values };
}

function* csvChunks(table: MemberTable, chunkMembers: number): Generator<Uint8Array> {
  const members = table.values[0]?.length ?? 0;
  const encoder = new TextEncoder();
  for (let from = 0; from < members || from === 0; from += chunkMembers) {
    const slice = { columns: table.columns, values: table.values.map((v) => v.subarray(from, Math.min(members, from + chunkMembers))) };
    const text = memberTableCsv(slice);
    // Every chunk after the first drops the header line memberTableCsv writes.
    yield encoder.encode(from === 0 ? text : text.slice(text.indexOf("\r\n") + 2));
    if (members === 0) return;
  }
}

try {
  const request = workerData as MemberTableRequest;
  const table = prepare(request);
  if (table) {
    const members = table.values[0]?.length ?? 0;
    post({ type: "ready", members, columns: table.columns, values: members <= request.columnsUpTo ? table.values : null });
    const chunks = csvChunks(table, request.chunkMembers);
    port.on("message", (message: ToMemberTableThread) => {
      if (message.type !== "next") return;
      const next = chunks.next();
      if (next.done) post({ type: "end" });
      else post({ type: "chunk", bytes: next.value }, [next.value.buffer as ArrayBuffer]);
    });
  }
} catch (error) {
  post({ type: "failed", message: error instanceof Error ? error.message : String(error) });
}
