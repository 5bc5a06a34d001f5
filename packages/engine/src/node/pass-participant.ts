import { MEMBER_BLOCK, advanceReportedBlock } from "../ensemble/advance-year.js";
import type { EnsemblePlan } from "../ensemble/ensemble-plan.js";
import type { PlanSetup } from "../ensemble/plan-setup.js";
import { resetForReporting, runBaselinePass } from "../ensemble/pathway-passes.js";
import { YearSummariser } from "../ensemble/summarise-year.js";
import { CANCEL_FLAG, addAndWake, waitUntilAtLeast, type PipelineControl } from "./pipeline-control.js";

/**
 * Where a pass stops for the thread running it: "claim" between two claimed pieces of work
 * (a place to check for cancellation, or to let an event loop run), or a wait until
 * cell[index] ≥ value (other threads are finishing what this thread needs next).
 */
export type PassPause = "claim" | { cell: Int32Array; index: number; value: number };

/** The reporting pass of one pathway, as the main thread describes it to every thread. */
export interface ReportOrder {
  pathway: number;
  weighted: boolean;
  totalWeight: number;
  horizonsByYear: number[][];
}

/**
 * One thread's part in running a pathway together with the others. In each pass it claims
 * member blocks (MEMBER_BLOCK members) from a shared counter until none are left; in the
 * reporting pass it does so span by span, then claims years of the finished span to
 * summarise. Summaries read whole years in member order, so the results are identical
 * whoever did what.
 *
 * The passes are generators that pause where a thread may have to wait (PassPause), so the
 * same code serves a worker thread, which blocks on the shared counter (runBlocking), and
 * the thread that called the runner, which keeps its event loop turning while it takes its
 * share (runCooperatively in run-ensemble-parallel.ts). A generator ends with false when
 * the run was cancelled.
 */
export class PassParticipant {
  private readonly summariser: YearSummariser;
  private simulateSeconds = 0;
  private summariseSeconds = 0;

  constructor(
    private readonly plan: EnsemblePlan,
    private readonly control: PipelineControl,
  ) {
    this.summariser = new YearSummariser(plan);
  }

  /** Seconds simulating and summarising since the last call. */
  takeTimes(): { simulateSeconds: number; summariseSeconds: number } {
    const times = { simulateSeconds: this.simulateSeconds, summariseSeconds: this.summariseSeconds };
    this.simulateSeconds = 0;
    this.summariseSeconds = 0;
    return times;
  }

  private cancelled(): boolean {
    return Atomics.load(this.control.flags, CANCEL_FLAG) !== 0;
  }

  /** Set-up's sampling jobs (plan-setup.ts), claimed from the counter at index `spans` of blockClaims. */
  sample(setup: PlanSetup): Generator<PassPause, boolean> {
    return this.claimEach(setup.jobs.length, (j) => setup.sample(j));
  }

  /** The member climate's pieces for source `variant` of F2x, claimed as sample() claims its jobs (the counters reset between). */
  buildClimates(setup: PlanSetup, variant: number): Generator<PassPause, boolean> {
    return this.claimEach(setup.pieces, (k) => setup.buildClimate(k, variant));
  }

  private *claimEach(count: number, work: (index: number) => void): Generator<PassPause, boolean> {
    const { control } = this;
    const at = control.blockClaims.length - 1;
    for (;;) {
      yield "claim";
      if (this.cancelled()) return false;
      const i = Atomics.add(control.blockClaims, at, 1);
      if (i >= count) return true;
      work(i);
    }
  }

  /** First pass of a pathway: member blocks claimed from the counter at index `spans` of blockClaims. */
  *baseline(pathwayIndex: number): Generator<PassPause, boolean> {
    const { plan, control } = this;
    const n = plan.members;
    const blocks = Math.ceil(n / MEMBER_BLOCK);
    const at = control.blockClaims.length - 1;
    const start = performance.now();
    for (;;) {
      yield "claim";
      if (this.cancelled()) return false;
      const b = Atomics.add(control.blockClaims, at, 1);
      if (b >= blocks) break;
      runBaselinePass(plan, pathwayIndex, b * MEMBER_BLOCK, Math.min(n, (b + 1) * MEMBER_BLOCK));
    }
    this.simulateSeconds += (performance.now() - start) / 1000;
    return true;
  }

  /** Reporting pass of a pathway: simulate span by span, summarise each finished span's years. */
  *report(order: ReportOrder): Generator<PassPause, boolean> {
    const { plan, control } = this;
    const pathway = plan.pathways[order.pathway]!;
    const ring = plan.state.slots.length;
    const weights = order.weighted ? plan.state.weights : null;
    const n = plan.members;
    const blocks = Math.ceil(n / MEMBER_BLOCK);
    const span = plan.spanYears;
    for (let s = 0, t0 = 0; t0 < pathway.years; s++, t0 += span) {
      const t1 = Math.min(pathway.years, t0 + span);
      // The slots of years t0..t1 last held years t − ring: those must have been summarised.
      for (let t = Math.max(t0, ring); t < t1; t++) yield { cell: control.summarised, index: t - ring, value: 1 };
      const start = performance.now();
      for (;;) {
        yield "claim";
        if (this.cancelled()) return false;
        const b = Atomics.add(control.blockClaims, s, 1);
        if (b >= blocks) break;
        if (s === 0) resetForReporting(plan, b * MEMBER_BLOCK, Math.min(n, (b + 1) * MEMBER_BLOCK));
        advanceReportedBlock(plan, order.pathway, t0, t1, b);
        addAndWake(control.blocksDone, s, 1);
      }
      this.simulateSeconds += (performance.now() - start) / 1000;
      yield { cell: control.blocksDone, index: s, value: blocks };
      const summaryStart = performance.now();
      for (;;) {
        const j = Atomics.add(control.yearClaims, s, 1);
        if (t0 + j >= t1) break;
        const t = t0 + j;
        this.summariser.summarise(
          order.pathway,
          t,
          pathway.years,
          plan.state.slots[t % ring]!,
          weights,
          order.totalWeight,
          order.horizonsByYear[t]!,
        );
        addAndWake(control.summarised, t, 1);
        yield "claim";
      }
      this.summariseSeconds += (performance.now() - summaryStart) / 1000;
    }
    // Every year has been claimed; once all threads are done, all are summarised.
    return true;
  }
}

/** Runs a pass on a worker thread, blocking while it waits. Returns false if cancelled. */
export function runBlocking(control: PipelineControl, pass: Generator<PassPause, boolean>): boolean {
  for (let step = pass.next(); ; step = pass.next()) {
    if (step.done) return step.value;
    const pause = step.value;
    if (pause !== "claim" && !waitUntilAtLeast(control, pause.cell, pause.index, pause.value)) return false;
  }
}
