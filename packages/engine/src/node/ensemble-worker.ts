import { parentPort } from "node:worker_threads";
import { MEMBER_BLOCK, advanceReportedBlock } from "../ensemble/advance-year.js";
import type { EnsemblePlan } from "../ensemble/ensemble-plan.js";
import { resetForReporting, runBaselinePass } from "../ensemble/pathway-passes.js";
import { YearSummariser } from "../ensemble/summarise-year.js";
import { WARM_MEMBERS, warmKernels } from "../ensemble/warm-kernels.js";
import { CANCEL_FLAG, addAndWake, waitUntilAtLeast, type PipelineControl } from "./pipeline-control.js";
import type { FromWorker, ToWorker } from "./worker-messages.js";

/**
 * One worker of the parallel runner. In each pass it claims member blocks (MEMBER_BLOCK
 * members) from a shared counter until none are left; in the reporting pass it does so
 * span by span, then claims years of the finished span to summarise. Summaries read whole
 * years in member order, so the results are identical to one thread whoever did what.
 */

let plan: EnsemblePlan;
let control: PipelineControl;
let summariser: YearSummariser;
let simulateSeconds = 0;
let summariseSeconds = 0;

const port = parentPort!;
const send = (message: FromWorker) => port.postMessage(message);
const cancelled = () => Atomics.load(control.flags, CANCEL_FLAG) !== 0;

port.on("message", (message: ToWorker) => {
  try {
    if (message.kind === "plan") {
      ({ plan, control } = message);
      summariser = new YearSummariser(plan);
      // Each worker warms its kernels on its own few members (warm-kernels.ts), inside the run's time.
      const lo = Math.min(plan.members, message.worker * WARM_MEMBERS);
      warmKernels(plan, lo, Math.min(plan.members, lo + WARM_MEMBERS));
      send({ kind: "ready" });
    } else if (message.kind === "baseline") {
      const start = performance.now();
      const finished = baselinePass(message.pathway);
      const seconds = (performance.now() - start) / 1000;
      send(finished ? { kind: "done", simulateSeconds: seconds, summariseSeconds: 0 } : { kind: "cancelled" });
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

/** Claims member blocks of the first pass (counter at index `spans` of blockClaims). */
function baselinePass(pathwayIndex: number): boolean {
  const n = plan.members;
  const blocks = Math.ceil(n / MEMBER_BLOCK);
  const at = control.blockClaims.length - 1;
  for (;;) {
    if (cancelled()) return false;
    const b = Atomics.add(control.blockClaims, at, 1);
    if (b >= blocks) return true;
    runBaselinePass(plan, pathwayIndex, b * MEMBER_BLOCK, Math.min(n, (b + 1) * MEMBER_BLOCK));
  }
}

function reportPathway(message: Extract<ToWorker, { kind: "report" }>): boolean {
  const pathway = plan.pathways[message.pathway]!;
  const ring = plan.state.slots.length;
  const weights = message.weighted ? plan.state.weights : null;
  const n = plan.members;
  const blocks = Math.ceil(n / MEMBER_BLOCK);
  const span = plan.spanYears;
  for (let s = 0, t0 = 0; t0 < pathway.years; s++, t0 += span) {
    const t1 = Math.min(pathway.years, t0 + span);
    // The slots of years t0..t1 last held years t − ring: those must have been summarised.
    for (let t = Math.max(t0, ring); t < t1; t++) if (!waitUntilAtLeast(control, control.summarised, t - ring, 1)) return false;
    const start = performance.now();
    for (;;) {
      if (cancelled()) return false;
      const b = Atomics.add(control.blockClaims, s, 1);
      if (b >= blocks) break;
      if (s === 0) resetForReporting(plan, b * MEMBER_BLOCK, Math.min(n, (b + 1) * MEMBER_BLOCK));
      advanceReportedBlock(plan, message.pathway, t0, t1, b);
      addAndWake(control.blocksDone, s, 1);
    }
    simulateSeconds += (performance.now() - start) / 1000;
    if (!waitUntilAtLeast(control, control.blocksDone, s, blocks)) return false;
    const summaryStart = performance.now();
    for (;;) {
      const j = Atomics.add(control.yearClaims, s, 1);
      if (t0 + j >= t1) break;
      const t = t0 + j;
      summariser.summarise(t, pathway.years, plan.state.slots[t % ring]!, weights, message.totalWeight, message.horizonsByYear[t]!);
      addAndWake(control.summarised, t, 1);
    }
    summariseSeconds += (performance.now() - summaryStart) / 1000;
  }
  // Every year has been claimed; once all workers report done, all are summarised.
  return true;
}
