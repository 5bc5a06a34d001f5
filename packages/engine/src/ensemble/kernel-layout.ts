import type { KernelMemory } from "../kernels/kernel-memory.js";
import type { MemberClimate } from "./member-climate.js";
import type { EnsembleState } from "./ensemble-plan.js";
import type { PathwayForcing } from "./pathway-forcing.js";

/**
 * What the member kernels (kernels/member-kernels.wat) are handed instead of arrays: byte
 * addresses in the plan's kernel memory.
 */
export interface KernelLayout {
  memory: WebAssembly.Memory;
  /** The per-member arrays of the two-layer step (plan.climate, state) in the order the .wat's frame lists them. */
  frame: Int32Array;
  /**
   * Per pathway, per forcing slot (pathway-forcing.ts slotColumns, padded to its
   * scaleWidth): the address of the scale column the forcing kernel reads, state.zeros for
   * padding slots (0 · 0 adds an exact zero, so padding changes no sum).
   */
  forcingColumns: Int32Array[];
  /** Per pathway, its slotBase (slot j, year t at j · years + t) copied into kernel memory. */
  forcingCoefficients: Float64Array[];
}

export function layOutKernels(
  memory: KernelMemory,
  climate: MemberClimate,
  state: EnsembleState,
  columns: Float64Array[],
  pathways: PathwayForcing[],
): KernelLayout {
  return {
    memory: memory.memory,
    frame: frameOf(memory, climate, state),
    forcingColumns: pathways.map((p) => {
      const table = memory.int32(p.scaleWidth);
      for (let j = 0; j < p.scaleWidth; j++) table[j] = (j < p.slotColumns.length ? columns[p.slotColumns[j]!]! : state.zeros).byteOffset;
      return table;
    }),
    forcingCoefficients: pathways.map((p) => {
      const copy = memory.float64(p.slotBase.length);
      copy.set(p.slotBase);
      return copy;
    }),
  };
}

function frameOf(memory: KernelMemory, climate: MemberClimate, state: EnsembleState): Int32Array {
  const { a11, a12, a21, a22, b1, b2, lambda, extraUptake, m11, m12, m21, m22, r1, r2 } = climate;
  const { upper, deep, baselineMean, windowMean, nextThreshold, crossedMembers } = state;
  const arrays = [
    a11,
    a12,
    a21,
    a22,
    b1,
    b2,
    upper,
    deep,
    baselineMean,
    windowMean,
    nextThreshold,
    lambda,
    extraUptake,
    crossedMembers,
    m11,
    m12,
    m21,
    m22,
    r1,
    r2,
  ];
  const frame = memory.int32(arrays.length);
  arrays.forEach((array, i) => (frame[i] = array.byteOffset));
  return frame;
}
