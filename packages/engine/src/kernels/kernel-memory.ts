import "./webassembly-globals.js";

/**
 * One run's per-member arrays, placed in a single WebAssembly memory so the member kernels
 * (member-kernels.wat) can read and write them, and shared so worker threads see the same
 * arrays (a shared memory's buffer is a SharedArrayBuffer; posting the memory or a typed
 * array over it to a worker shares, it does not copy).
 *
 * Allocation only bumps a pointer: arrays live as long as the run's plan. Each array starts
 * on a 16-byte boundary (two doubles, one SIMD lane pair) and its byteOffset is its address
 * in the kernels' memory. The memory grows as arrays are added; a shared memory never
 * detaches its old buffer on growth, so every array handed out stays valid. Every array
 * starts zero, like a new Float64Array.
 *
 * A runner that has finished with a memory hands it back (keepKernelMemory) and the next run
 * on the same thread allocates in it again, each array zeroed as it is handed out (but
 * scratch64's, which its run writes before reading). Why:
 * the first touch of a fresh 4 KiB page costs ~11 µs on the machines the engine was measured
 * on, and a 100,000-member run touches ~10,000 pages of member arrays — about a fifth of a
 * one-thread run (measured, W1 at 100,000 members, one thread, warm: 0.51 s with fresh
 * memory, 0.42 s reusing it, page faults 9,500 → 700; zeroing 60 MB costs ~2 ms).
 */
export interface KernelMemory {
  readonly memory: WebAssembly.Memory;
  float64: (length: number) => Float64Array;
  int32: (length: number) => Int32Array;
  /**
   * An array its run writes in full before it reads it (a year slot): not zeroed when the
   * memory is reused, so one the run never uses (a slot of a series not summarised) costs
   * nothing: its pages are not touched at all.
   */
  scratch64: (length: number) => Float64Array;
}

const PAGE = 65536;
/** wasm32 addresses 4 GiB at most; the engine's member limit keeps a run far below it. */
const MAX_PAGES = 65536;

/**
 * A memory is kept for reuse only up to this size (a run of ~150,000 members with every
 * summary), so an idle thread holds at most this much; a bigger run's memory is collected.
 */
export const KEPT_MEMORY_BYTES = 128 * 2 ** 20;

/** This thread's kept memory, if any: at most one. */
let kept: WebAssembly.Memory | null = null;

/**
 * Hands back a memory whose run is over — no thread will read or write it again, and no
 * array of it is still in use — for the next createKernelMemory on this thread to reuse.
 */
export function keepKernelMemory(memory: WebAssembly.Memory): void {
  if (memory.buffer.byteLength <= KEPT_MEMORY_BYTES) kept = memory;
}

export function createKernelMemory(): KernelMemory {
  const reused = kept;
  kept = null;
  const memory = reused ?? new WebAssembly.Memory({ initial: 1, maximum: MAX_PAGES, shared: true });
  // Bytes below this may hold an earlier run's values (memory grown after it is fresh, zero).
  const used = reused ? memory.buffer.byteLength : 0;
  // Address 0 is kept unused, so a kernel can take 0 to mean "no array".
  let top = 16;
  const reserve = (bytes: number, zeroed = true): number => {
    const at = top;
    top = at + Math.ceil(bytes / 16) * 16;
    const have = memory.buffer.byteLength;
    if (top > have) {
      // Grow by at least half again, so a run's many allocations grow the memory a few times only.
      const needed = Math.ceil((top - have) / PAGE);
      const pages = Math.min(Math.max(needed, Math.ceil(have / PAGE / 2)), MAX_PAGES - have / PAGE);
      if (pages < needed) throw new RangeError(`a run needs more than ${MAX_PAGES * PAGE} bytes of member arrays`);
      memory.grow(pages);
    }
    // Both ends are multiples of 8: a Float64Array fill is ~8× faster than a byte fill over shared memory.
    if (zeroed && at < used) new Float64Array(memory.buffer, at, (Math.min(top, used) - at) / 8).fill(0);
    return at;
  };
  // reserve() first: it may grow the memory, and only the buffer read after that covers it.
  return {
    memory,
    float64(length) {
      const at = reserve(8 * length);
      return new Float64Array(memory.buffer, at, length);
    },
    int32(length) {
      const at = reserve(4 * length);
      return new Int32Array(memory.buffer, at, length);
    },
    scratch64(length) {
      const at = reserve(8 * length, false);
      return new Float64Array(memory.buffer, at, length);
    },
  };
}
