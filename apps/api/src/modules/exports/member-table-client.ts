import { Worker } from "node:worker_threads";
import { conflict } from "../../errors/app-error.js";
import { threadEntry } from "../../workers/thread-entry.js";
import type { FromMemberTableThread, MemberTableRequest } from "./member-table-protocol.js";

/** Members per CSV chunk (about 2 MB at 20 columns): the file streams out at the client's pace. */
export const MEMBER_CSV_CHUNK_MEMBERS = 5_000;

/** A recomputed member table: its shape, the columns when small enough, and the CSV chunk by chunk. */
export interface OpenMemberTable {
  members: number;
  columns: string[];
  /** One Float64Array per column, or null above `columnsUpTo` members. */
  values: Float64Array[] | null;
  /** The CSV bytes in order; each chunk is produced when asked for (the caller's pace). */
  chunks(): AsyncGenerator<Uint8Array>;
  /** Stops the thread (after the last chunk, or when the caller gives up). */
  close(): Promise<void>;
}

/**
 * Starts a thread that recomputes the run's member table (member-table-thread.ts) and waits
 * until it is ready. A run whose engine version or result hash does not come back is refused
 * with 409 and the thread's reason; an engine failure rejects with its message.
 */
export async function openMemberTable(request: MemberTableRequest): Promise<OpenMemberTable> {
  const { entry, eval: isCode } = threadEntry(import.meta.url, "member-table-thread");
  const worker = new Worker(entry, { eval: isCode, name: "member-table", workerData: request });
  const queue: FromMemberTableThread[] = [];
  let wake: (() => void) | null = null;
  let died = null as Error | null;
  worker.on("message", (m: FromMemberTableThread) => {
    queue.push(m);
    wake?.();
  });
  worker.on("error", (e) => {
    died = new Error(`member-table thread failed: ${e.message}`);
    wake?.();
  });
  worker.on("exit", (code) => {
    died ??= new Error(`member-table thread exited with code ${code}`);
    wake?.();
  });
  const next = async (): Promise<FromMemberTableThread> => {
    while (queue.length === 0) {
      if (died) throw died;
      await new Promise<void>((resolve) => (wake = resolve));
      wake = null;
    }
    return queue.shift()!;
  };
  const close = async () => {
    died ??= new Error("member-table thread closed");
    await worker.terminate();
  };

  const first = await next().catch(async (e: unknown) => {
    await close();
    throw e;
  });
  if (first.type !== "ready") {
    await close();
    if (first.type === "refused") throw conflict(first.message, first.code);
    throw new Error(first.type === "failed" ? `member table: ${first.message}` : `member table: unexpected ${first.type}`);
  }
  return {
    members: first.members,
    columns: first.columns,
    values: first.values,
    close,
    async *chunks() {
      for (;;) {
        worker.postMessage({ type: "next" });
        const m = await next();
        if (m.type === "end") return;
        if (m.type !== "chunk") throw new Error(`member table: unexpected ${m.type}`);
        yield m.bytes;
      }
    },
  };
}
