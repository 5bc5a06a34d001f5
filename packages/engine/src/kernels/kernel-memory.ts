import "./webassembly-globals.js";

/**
 * One run's per-member arrays, placed in a single WebAssembly memory so the member kernels
 * (member-kernels.wat) can read and write them, and shared so worker threads see the same
 * arrays (a shared memory's buffer is a SharedArrayBuffer; posting the memory or a typed
 * array over it to a worker shares, it does not copy).
 *
 * Allocation only bumps a pointer: arrays live as long as the run's plan, then the whole
 * memory is collected with it. Each array starts on a 16-byte boundary (two doubles, one
 * SIMD lane pair) and its byteOffset is its address in the kernels' memory. The memory
 * grows as arrays are added; a shared memory never detaches its old buffer on growth, so
 * every array handed out stays valid. Fresh memory is zero, like a new Float64Array.
 */
export interface KernelMemory {
  readonly memory: WebAssembly.Memory;
  float64: (length: number) => Float64Array;
  int32: (length: number) => Int32Array;
}

const PAGE = 65536;
/** wasm32 addresses 4 GiB at most; the engine's member limit keeps a run far below it. */
const MAX_PAGES = 65536;

export function createKernelMemory(): KernelMemory {
  const memory = new WebAssembly.Memory({ initial: 1, maximum: MAX_PAGES, shared: true });
  // Address 0 is kept unused, so a kernel can take 0 to mean "no array".
  let top = 16;
  const reserve = (bytes: number): number => {
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
  };
}
