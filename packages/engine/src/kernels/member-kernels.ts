import { kernelInstance } from "./kernel-instance.js";
import { MEMBER_KERNELS_WASM } from "./member-kernels-wasm.js";

/**
 * The member kernels (member-kernels.wat) as functions over one kernel memory. Addresses are
 * byte offsets in that memory (a Float64Array's byteOffset); the .wat documents each
 * function's arguments.
 */
export interface MemberKernels {
  forcing(
    out: number,
    lo: number,
    n: number,
    base: number,
    columns: number,
    coefficients: number,
    stride: number,
    width: number,
    extremes: number,
  ): void;
  baselineStep(frame: number, lo: number, n: number, forcing: number, inBaseline: number, inWindow: number): void;
  reportedStep(
    frame: number,
    lo: number,
    n: number,
    forcing: number,
    anomaly: number,
    imbalance: number,
    extremes: number,
    lowest: number,
    above: number,
  ): number;
}

/** The kernels over `memory` (one instance per memory and thread, kernel-instance.ts). */
export function memberKernels(memory: WebAssembly.Memory): MemberKernels {
  return kernelInstance(MEMBER_KERNELS_WASM, memory) as unknown as MemberKernels;
}
