import { kernelInstance } from "./kernel-instance.js";
import { RANDOM_KERNELS_WASM } from "./random-kernels-wasm.js";

/**
 * Alea's fill loops (random-kernels.wat) over one kernel memory: `out` addresses are byte
 * offsets of Float64Arrays in that memory; states go in as (c, s0, s1, s2) and come back
 * the same way, after the draws.
 */
export interface RandomKernels {
  fill(out: number, n: number, c: number, s0: number, s1: number, s2: number): [number, number, number, number];
  fillTwo(
    outA: number,
    outB: number,
    n: number,
    c: number,
    s0: number,
    s1: number,
    s2: number,
    d: number,
    r0: number,
    r1: number,
    r2: number,
  ): [number, number, number, number, number, number, number, number];
}

export function randomKernels(memory: WebAssembly.Memory): RandomKernels {
  return kernelInstance(RANDOM_KERNELS_WASM, memory) as unknown as RandomKernels;
}
