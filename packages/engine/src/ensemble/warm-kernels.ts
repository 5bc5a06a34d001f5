import { PercentileSelector } from "../summary/percentile-selector.js";
import { MEMBER_BLOCK, countAbove } from "./advance-year.js";
import { blockSteppers } from "./block-steppers.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import { forcingKernel } from "./member-forcing.js";
import { resetForReporting, runBaselinePass } from "./pathway-passes.js";

/** Members each worker thread warms its kernels on (worker w: members [w·256, (w + 1)·256)). */
export const WARM_MEMBERS = 256;

/**
 * Runs the hot loops of a run on a few members before the run proper, so V8 has optimised
 * them by the time the whole ensemble goes through: in a fresh thread the first few hundred
 * thousand member-years otherwise run in the interpreter and baseline code (~0.3 s measured
 * for W1 at 100,000 members). Uses the plan's own kernels (block-steppers.ts and
 * member-forcing.ts specialise per plan, so warming other arrays would not help) on members
 * [lo, hi) of pathway 0 — a range no other thread uses until the run starts — and the
 * percentile selector on a small sample. The passes that follow reset every state they
 * read (runBaselinePass, resetForReporting, per-year tallies), so no number changes.
 * Cost: about (hi − lo) × (pathway years + first-pass years) member-years.
 */
export function warmKernels(plan: EnsemblePlan, lo: number, hi: number): void {
  if (hi <= lo || plan.pathways.length === 0) return;
  runBaselinePass(plan, 0, lo, hi);
  resetForReporting(plan, lo, hi);
  const forcing = forcingKernel(plan, 0);
  const steppers = blockSteppers(plan);
  const slots = plan.state.slots;
  const at = 6 * Math.floor(lo / MEMBER_BLOCK);
  const imbalance = plan.summaries.imbalance;
  const noCrossing = () => {};
  for (let t = 0; t < plan.pathways[0]!.years; t++) {
    const slot = slots[t % slots.length]!;
    forcing(t, lo, hi, slot.forcing, 0, slot.extremes, at);
    steppers.reported(lo, hi, slot.forcing, slot.anomaly, imbalance ? slot.imbalance : null, slot.extremes, at, noCrossing);
    countAbove(slot.anomaly, lo, hi, 1);
  }
  warmSelector(plan.probs);
}

function warmSelector(probs: number[]): void {
  const n = 4096;
  const values = new Float64Array(n);
  for (let i = 0; i < n; i++) values[i] = Math.sin(i * 12.9898) * 0.5; // any spread of values will do
  const out = new Float64Array(probs.length);
  const selector = new PercentileSelector();
  for (let r = 0; r < 40; r++) {
    selector.select(values, n, probs, out, -0.5, 0.5);
    selector.selectNear(values, n, probs, out, -0.5, 0.5, out, out.map(() => 0.01));
  }
}
