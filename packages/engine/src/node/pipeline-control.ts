/**
 * The shared counters that let worker threads stream one pathway's reporting pass together
 * (Int32Array over a SharedArrayBuffer, used with Atomics):
 * - simulated[t]: how many workers have written their members of year t into its slot;
 * - summarised[t]: 1 once year t has been summarised, so its slot may be reused;
 * - cancel: set to 1 by the main thread to stop every worker at the next year.
 */
export interface PipelineControl {
  simulated: Int32Array;
  summarised: Int32Array;
  flags: Int32Array;
}

export const CANCEL_FLAG = 0;

export function createPipelineControl(maxYears: number): PipelineControl {
  return {
    simulated: new Int32Array(new SharedArrayBuffer(4 * maxYears)),
    summarised: new Int32Array(new SharedArrayBuffer(4 * maxYears)),
    flags: new Int32Array(new SharedArrayBuffer(4 * 4)),
  };
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
