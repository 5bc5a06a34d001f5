import type { RunResult, RunSpec } from "@plumeline/contracts";
import { AppError } from "../../errors/app-error.js";
import { EngineThread } from "../../workers/engine-thread-client.js";

/** Previews run one at a time, so review screens never take more than one core from queued runs. */
let previous: Promise<unknown> = Promise.resolve();

/**
 * Runs the preview ensembles in a fresh engine worker thread (the same thread code the run
 * workers use), one after the other, and ends the thread. The server's event loop only posts
 * the specs and receives the results. A spec the engine refuses is a 409 naming the reason.
 */
export function runPreviewEnsembles(specs: RunSpec[], label: string): Promise<RunResult[]> {
  const task = previous.then(() => runInThread(specs, label));
  previous = task.catch(() => undefined);
  return task;
}

async function runInThread(specs: RunSpec[], label: string): Promise<RunResult[]> {
  const thread = new EngineThread(`impact-${label}`);
  try {
    const results: RunResult[] = [];
    for (const spec of specs) {
      const outcome = await thread.run(spec);
      if (outcome.kind !== "done")
        throw new AppError(409, "impact_failed", `The preview ensemble did not finish: ${outcome.kind === "failed" ? outcome.message : "cancelled"}.`);
      results.push(outcome.result);
    }
    return results;
  } finally {
    await thread.terminate();
  }
}
