import type { RunResult, RunSpec } from "@plumeline/contracts";

/** Messages between the server thread and an engine thread (structured-cloned). */
export type ToEngineThread = {
  type: "run";
  spec: RunSpec;
  /** Int32Array(1) over shared memory: the server sets [0] = 1 to ask for cancellation. */
  cancelFlag: SharedArrayBuffer;
};

export type FromEngineThread =
  | { type: "progress"; fraction: number }
  /** `contractWarning`: where the result deviates from the contracts schema (checked here, off the server thread). */
  | { type: "done"; result: RunResult; contractWarning?: string }
  | { type: "cancelled" }
  /** The engine refused or failed on this spec: deterministic, so not worth a retry. */
  | { type: "failed"; message: string };
