import { parentPort } from "node:worker_threads";
import { advanceReportedYears } from "../ensemble/advance-year.js";
import type { EnsemblePlan } from "../ensemble/ensemble-plan.js";
import { resetForReporting, runBaselinePass } from "../ensemble/pathway-passes.js";
import { YearSummariser } from "../ensemble/summarise-year.js";
import { CANCEL_FLAG, addAndWake, waitUntilAtLeast, type PipelineControl } from "./pipeline-control.js";
import type { FromWorker, ToWorker } from "./worker-messages.js";

/**
 * One worker of the parallel runner. It advances its own members [lo, hi) a span of years
 * at a time and, in the reporting pass, summarises every year t of the span with
 * t mod workers = its number once all workers have written year t, so simulation is split
 * by member and summaries by year. Summaries
 * read whole years in member order, hence results identical to one thread.
 */
let plan: EnsemblePlan;
let control: PipelineControl;
let me = 0;
let workers = 1;
let lo = 0;
let hi = 0;
let summariser: YearSummariser;
let simulateSeconds = 0;
let summariseSeconds = 0;

const port = parentPort!;
const send = (message: FromWorker) => port.postMessage(message);

port.on("message", (message: ToWorker) => {
  try {
    if (message.kind === "plan") {
      ({ plan, control, worker: me, workers, lo, hi } = message);
      summariser = new YearSummariser(plan);
      send({ kind: "ready" });
    } else if (message.kind === "baseline") {
      const start = performance.now();
      runBaselinePass(plan, message.pathway, lo, hi);
      send({ kind: "done", simulateSeconds: (performance.now() - start) / 1000, summariseSeconds: 0 });
    } else if (message.kind === "report") {
      simulateSeconds = 0;
      summariseSeconds = 0;
      const finished = reportPathway(message);
      send(finished ? { kind: "done", simulateSeconds, summariseSeconds } : { kind: "cancelled" });
    } else if (message.kind === "stop") {
      port.close();
    }
  } catch (error) {
    const e = error instanceof Error ? error : new Error(String(error));
    send({ kind: "failed", message: e.message, ...(e.stack ? { stack: e.stack } : {}) });
  }
});

function reportPathway(message: Extract<ToWorker, { kind: "report" }>): boolean {
  const pathway = plan.pathways[message.pathway]!;
  const ring = plan.state.slots.length;
  const weights = message.weighted ? plan.state.weights : null;
  resetForReporting(plan, lo, hi);
  const span = plan.spanYears;
  for (let t0 = 0; t0 < pathway.years; t0 += span) {
    const t1 = Math.min(pathway.years, t0 + span);
    if (Atomics.load(control.flags, CANCEL_FLAG) !== 0) return false;
    // The slots of years t0..t1 last held years t − ring: those must have been summarised.
    for (let t = Math.max(t0, ring); t < t1; t++) if (!waitUntilAtLeast(control, control.summarised, t - ring, 1)) return false;
    const start = performance.now();
    advanceReportedYears(plan, pathway, t0, t1, lo, hi, me);
    simulateSeconds += (performance.now() - start) / 1000;
    for (let t = t0; t < t1; t++) addAndWake(control.simulated, t, 1);
    for (let t = t0; t < t1; t++) {
      if (t % workers !== me) continue;
      if (!waitUntilAtLeast(control, control.simulated, t, workers)) return false;
      const summaryStart = performance.now();
      summariser.summarise(t, pathway.years, plan.state.slots[t % ring]!, weights, message.totalWeight, message.horizonsByYear[t]!);
      summariseSeconds += (performance.now() - summaryStart) / 1000;
      addAndWake(control.summarised, t, 1);
    }
  }
  // Each worker has summarised all of its years; once all report done, the pathway is complete.
  return true;
}
