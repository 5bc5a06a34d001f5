import "./webassembly-globals.js";

import { MEMBER_KERNELS_WASM } from "./member-kernels-wasm.js";

/**
 * The member kernels (member-kernels.wat) as functions over one kernel memory. Addresses are
 * byte offsets in that memory (a Float64Array's byteOffset); the .wat documents each
 * function's arguments.
 */
export interface MemberKernels {
  forcing(out: number, lo: number, n: number, base: number, columns: number, coefficients: number, stride: number, width: number, extremes: number): void;
  baselineStep(frame: number, lo: number, n: number, forcing: number, inBaseline: number, inWindow: number): void;
  reportedStep(frame: number, lo: number, n: number, forcing: number, anomaly: number, imbalance: number, extremes: number, lowest: number, above: number): number;
}

let compiled: WebAssembly.Module | null = null;
const instances = new WeakMap<WebAssembly.Memory, MemberKernels>();

/**
 * The kernels over `memory`: one instance per memory and thread (an instance is not
 * shared between threads; the memory is). Compiling takes well under a millisecond.
 */
export function memberKernels(memory: WebAssembly.Memory): MemberKernels {
  let kernels = instances.get(memory);
  if (!kernels) {
    compiled ??= new WebAssembly.Module(decodeBase64(MEMBER_KERNELS_WASM));
    const instance = new WebAssembly.Instance(compiled, { env: { memory } });
    kernels = instance.exports as unknown as MemberKernels;
    instances.set(memory, kernels);
  }
  return kernels;
}

function decodeBase64(text: string): Uint8Array {
  const binary = atob(text);
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return bytes;
}
