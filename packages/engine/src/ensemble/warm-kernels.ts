import { PercentileSelector } from "../summary/percentile-selector.js";
import { MEMBER_BLOCK, advanceReportedMembers } from "./advance-year.js";
import type { EnsemblePlan } from "./ensemble-plan.js";
import { resetForReporting, runBaselinePass } from "./pathway-passes.js";

/** Members of the small ensemble a helper thread warms its kernels on when it starts. */
export const WARM_MEMBERS = 256;

/**
 * Runs the hot code of a run on a few members before the run proper: the percentile
 * selector is JavaScript, which V8 only optimises after it has run for a while (in a fresh
 * thread the first years' summaries otherwise run in the interpreter), and V8 compiles the
 * member kernels' WebAssembly with a quick compiler first and an optimising one once they
 * are called often. Uses members [lo, hi) of pathway 0 of `plan` and the selector on a
 * small sample; a helper thread runs it once, on a plan of its own
 * (node/ensemble-worker.ts), so no run's numbers are touched. Cost: about (hi − lo) × (pathway years + first-pass years) member-years.
 */
export function warmKernels(plan: EnsemblePlan, lo: number, hi: number): void {
  if (hi <= lo || plan.pathways.length === 0) return;
  runBaselinePass(plan, 0, lo, hi);
  resetForReporting(plan, lo, hi);
  advanceReportedMembers(plan, 0, 0, plan.pathways[0]!.years, lo, hi, Math.floor(lo / MEMBER_BLOCK));
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
