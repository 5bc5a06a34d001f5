/**
 * The shared counters that let worker threads run one pathway together (Int32Array over a
 * SharedArrayBuffer, used with Atomics). Work is handed out by claiming, not by a fixed
 * split, so a thread that the machine slows down simply takes less of it:
 * - blockClaims[s] / blocksDone[s]: member blocks of reporting span s claimed / finished
 *   (the baseline pass uses index `spans`);
 * - yearClaims[s]: years of span s claimed for summarising;
 * - summarised[t]: 1 once year t has been summarised, so its slot may be reused;
 * - cancel: set to 1 by the main thread to stop every worker at the next check.
 * Which thread does what never changes a number: blocks are independent, tallies are
 * order-free (min, max, whole counts) and each year is summarised whole, in member order.
 */
export interface PipelineControl {
  blockClaims: Int32Array;
  blocksDone: Int32Array;
  yearClaims: Int32Array;
  summarised: Int32Array;
  flags: Int32Array;
}

export const CANCEL_FLAG = 0;

const shared = (length: number) => new Int32Array(new SharedArrayBuffer(4 * Math.max(1, length)));

export function createPipelineControl(maxYears: number): PipelineControl {
  return {
    blockClaims: shared(maxYears + 1),
    blocksDone: shared(maxYears + 1),
    yearClaims: shared(maxYears + 1),
    summarised: shared(maxYears),
    flags: shared(4),
  };
}

/** Clears the claim counters before a pass (the main thread does this while workers wait). */
export function resetPipelineControl(control: PipelineControl): void {
  control.blockClaims.fill(0);
  control.blocksDone.fill(0);
  control.yearClaims.fill(0);
  control.summarised.fill(0);
}

/** Blocks the calling worker until cell[index] ≥ value (or cancel is set). Returns false on cancel. */
export function waitUntilAtLeast(control: PipelineControl, cell: Int32Array, index: number, value: number): boolean {
  for (;;) {
    const seen = Atomics.load(cell, index);
    if (seen >= value) return true;
    if (Atomics.load(control.flags, CANCEL_FLAG) !== 0) return false;
    Atomics.wait(cell, index, seen, 50);
  }
}

export function addAndWake(cell: Int32Array, index: number, amount: number): void {
  Atomics.add(cell, index, amount);
  Atomics.notify(cell, index);
}
