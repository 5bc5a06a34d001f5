import { describe, expect, it } from "vitest";
import { KEPT_MEMORY_BYTES, createKernelMemory, keepKernelMemory } from "./kernel-memory.js";

describe("kernel memory kept between runs", () => {
  it("hands a kept memory out again with every array zero, like fresh memory", () => {
    const first = createKernelMemory();
    const a = first.float64(10_000);
    const b = first.int32(777);
    a.fill(7.5);
    b.fill(-3);
    keepKernelMemory(first.memory);
    const again = createKernelMemory();
    expect(again.memory).toBe(first.memory);
    // Laid out differently from the run before (odd lengths), and growing past its end.
    const c = again.int32(333);
    const d = again.float64(12_345);
    const e = again.float64(200_000);
    for (const array of [c, d, e]) expect(array.every((x) => x === 0)).toBe(true);
    expect(e.byteOffset + e.byteLength).toBeGreaterThan(a.byteOffset + a.byteLength);
  });

  it("leaves a scratch array as the run before left it (its run writes it before reading), a zeroed one beside it zero", () => {
    const first = createKernelMemory();
    first.float64(1_000).fill(2);
    keepKernelMemory(first.memory);
    const again = createKernelMemory();
    const scratch = again.scratch64(500);
    const zeroed = again.float64(500);
    expect(scratch.every((x) => x === 2)).toBe(true);
    expect(zeroed.every((x) => x === 0)).toBe(true);
  });

  it("hands it out once: a second memory asked for before it is kept again is a new one", () => {
    const first = createKernelMemory();
    keepKernelMemory(first.memory);
    expect(createKernelMemory().memory).toBe(first.memory);
    expect(createKernelMemory().memory).not.toBe(first.memory);
  });

  it("does not keep a memory bigger than KEPT_MEMORY_BYTES (a big run's memory is collected)", () => {
    const big = createKernelMemory();
    big.float64(KEPT_MEMORY_BYTES / 8 + 1);
    keepKernelMemory(big.memory);
    expect(createKernelMemory().memory).not.toBe(big.memory);
  });
});
