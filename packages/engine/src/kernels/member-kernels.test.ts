import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { KERNEL_MODULES, compileKernelText, kernelModuleSource } from "../../scripts/kernel-text.mjs";
import { createKernelMemory, type KernelMemory } from "./kernel-memory.js";
import { memberKernels } from "./member-kernels.js";

/*
 * The kernels against the plain arithmetic they stand for, written here in TypeScript one
 * member at a time, in the same order of operations (the two-layer step as
 * two-layer-propagator.ts defines it; the closed-form checks (Geoffroy et al. 2013a, one-box model) run
 * through these kernels in climate/ and ensemble/ tests). IEEE 754 double arithmetic
 * in the same order gives the same bits, so equality is exact: any difference is a bug.
 */

describe("the committed kernel bytes", () => {
  for (const kernel of KERNEL_MODULES)
    it(`are ${kernel.wat} compiled by wabt (rebuild: pnpm --filter @plumeline/engine build:kernels)`, async () => {
      const wat = readFileSync(new URL(`./${kernel.wat}`, import.meta.url), "utf8");
      const committed = readFileSync(new URL(`./${kernel.ts}`, import.meta.url), "utf8");
      expect(committed).toBe(kernelModuleSource(await compileKernelText(wat, kernel.wat), kernel));
    });
});

/** A small seeded stream (Park–Miller), enough to fill test arrays reproducibly. */
function stream(seed: number) {
  let s = seed;
  return (lo: number, hi: number) => {
    s = (s * 16807) % 2147483647;
    return lo + ((hi - lo) * s) / 2147483647;
  };
}

function filled(memory: KernelMemory, n: number, draw: () => number): Float64Array {
  const a = memory.float64(n);
  for (let i = 0; i < n; i++) a[i] = draw();
  return a;
}

describe("forcing kernel", () => {
  for (const width of [0, 4, 8, 12])
    for (const n of [1, 6, 7]) {
      it(`width ${width}, ${n} members from member 3: base + Σ scale·coefficient in order, and its extremes`, () => {
        const memory = createKernelMemory();
        const r = stream(width * 31 + n);
        const members = 3 + n + 2;
        const columns = Array.from({ length: width }, () => filled(memory, members, () => r(-1, 2)));
        const table = memory.int32(width);
        columns.forEach((c, j) => (table[j] = c.byteOffset));
        const years = 5;
        const coefficients = filled(memory, Math.max(1, width) * years, () => r(-2, 3));
        const out = memory.float64(members);
        const extremes = memory.float64(2);
        extremes[0] = 0.25; // an earlier block's min and max, kept unless passed
        extremes[1] = 0.5;
        const t = 2;
        const base = r(-1, 1);
        memberKernels(memory.memory).forcing(
          out.byteOffset,
          3,
          n,
          base,
          table.byteOffset,
          coefficients.byteOffset + 8 * t,
          8 * years,
          width,
          extremes.byteOffset,
        );
        let min = 0.25;
        let max = 0.5;
        for (let m = 3; m < 3 + n; m++) {
          let f = base;
          for (let j = 0; j < width; j++) f = f + columns[j]![m]! * coefficients[j * years + t]!;
          expect(out[m]).toBe(f);
          if (f < min) min = f;
          if (f > max) max = f;
        }
        expect([out[2], out[3 + n]]).toEqual([0, 0]); // members outside the range untouched
        expect([extremes[0], extremes[1]]).toEqual([min, max]);
      });
    }
});

/** Arrays of the step kernels, laid out as kernel-layout.ts lays out a plan's. */
function stepFixture(members: number, seed: number) {
  const memory = createKernelMemory();
  const r = stream(seed);
  const a = (lo: number, hi: number) => filled(memory, members, () => r(lo, hi));
  const arrays = {
    a11: a(0.8, 0.9),
    a12: a(0.01, 0.02),
    a21: a(0.001, 0.003),
    a22: a(0.99, 0.999),
    b1: a(0.1, 0.13),
    b2: a(0.0005, 0.001),
    upper: a(-0.5, 2),
    deep: a(-0.2, 1),
    baselineMean: a(-0.1, 0.1),
    windowMean: a(0, 0.2),
    nextThreshold: a(0.5, 2.5),
    lambda: a(0.8, 1.6),
    extraUptake: a(0, 0.2),
    m11: a(0.9, 0.95),
    m12: a(0.005, 0.01),
    m21: a(0.0005, 0.002),
    m22: a(0.995, 0.9995),
    r1: a(0.05, 0.07),
    r2: a(0.0001, 0.0004),
  };
  const crossed = memory.int32(members);
  const order = [
    "a11",
    "a12",
    "a21",
    "a22",
    "b1",
    "b2",
    "upper",
    "deep",
    "baselineMean",
    "windowMean",
    "nextThreshold",
    "lambda",
    "extraUptake",
  ] as const;
  const meanOrder = ["m11", "m12", "m21", "m22", "r1", "r2"] as const;
  const frame = memory.int32(20);
  order.forEach((name, i) => (frame[i] = arrays[name].byteOffset));
  frame[13] = crossed.byteOffset;
  meanOrder.forEach((name, i) => (frame[14 + i] = arrays[name].byteOffset));
  const forcing = a(-1, 4);
  const copy = Object.fromEntries(Object.entries(arrays).map(([k, v]) => [k, Float64Array.from(v)])) as typeof arrays;
  return { memory, arrays, before: copy, crossed, frame, forcing };
}

describe("step kernels", () => {
  for (const n of [1, 2, 9, 64]) {
    for (const [inBaseline, inWindow] of [
      [1, 0],
      [0, 1],
      [0, 0],
    ] as const)
      it(`baseline step, ${n} members from member 1, baseline ${inBaseline} window ${inWindow}: the exact propagator and the sums of the year's mean`, () => {
        const x = stepFixture(n + 2, n);
        memberKernels(x.memory.memory).baselineStep(x.frame.byteOffset, 1, n, x.forcing.byteOffset, inBaseline, inWindow);
        const b = x.before;
        for (let m = 1; m <= n; m++) {
          const f = x.forcing[m]!;
          const next = b.a11[m]! * b.upper[m]! + b.a12[m]! * b.deep[m]! + b.b1[m]! * f;
          const mean = b.m11[m]! * b.upper[m]! + b.m12[m]! * b.deep[m]! + b.r1[m]! * f;
          expect(x.arrays.upper[m]).toBe(next);
          expect(x.arrays.deep[m]).toBe(b.a21[m]! * b.upper[m]! + b.a22[m]! * b.deep[m]! + b.b2[m]! * f);
          expect(x.arrays.baselineMean[m]).toBe(inBaseline ? b.baselineMean[m]! + mean : b.baselineMean[m]!);
          expect(x.arrays.windowMean[m]).toBe(inWindow ? b.windowMean[m]! + mean : b.windowMean[m]!);
        }
        expect([x.arrays.upper[0], x.arrays.upper[n + 1]]).toEqual([b.upper[0], b.upper[n + 1]]);
      });

    for (const withImbalance of [false, true])
      it(`reporting step, ${n} members from member 1${withImbalance ? ", with imbalance" : ""}: anomaly, count above the lowest threshold, crossings, extremes`, () => {
        const x = stepFixture(n + 2, 100 + n);
        const anomaly = x.memory.float64(n + 2);
        const imbalance = x.memory.float64(n + 2);
        const tallies = x.memory.float64(7); // forcing min, max; anomaly min, max; imbalance min, max; count
        tallies.set([0, 0, Infinity, -Infinity, Infinity, -Infinity, -1]);
        const lowest = 1;
        const crossings = memberKernels(x.memory.memory).reportedStep(
          x.frame.byteOffset,
          1,
          n,
          x.forcing.byteOffset,
          anomaly.byteOffset,
          withImbalance ? imbalance.byteOffset : 0,
          tallies.byteOffset,
          lowest,
          tallies.byteOffset + 48,
        );
        const b = x.before;
        let above = 0;
        const crossed: number[] = [];
        let [amin, amax, nmin, nmax] = [Infinity, -Infinity, Infinity, -Infinity];
        for (let m = 1; m <= n; m++) {
          const f = x.forcing[m]!;
          const next = b.a11[m]! * b.upper[m]! + b.a12[m]! * b.deep[m]! + b.b1[m]! * f;
          const deep = b.a21[m]! * b.upper[m]! + b.a22[m]! * b.deep[m]! + b.b2[m]! * f;
          // The year's mean states, from the state at its start.
          const meanUpper = b.m11[m]! * b.upper[m]! + b.m12[m]! * b.deep[m]! + b.r1[m]! * f;
          const meanDeep = b.m21[m]! * b.upper[m]! + b.m22[m]! * b.deep[m]! + b.r2[m]! * f;
          const a = meanUpper - b.baselineMean[m]!;
          expect([x.arrays.upper[m], x.arrays.deep[m], anomaly[m]]).toEqual([next, deep, a]);
          if (a > lowest) above++;
          if (a > b.nextThreshold[m]!) crossed.push(m);
          if (a < amin) amin = a;
          if (a > amax) amax = a;
          if (withImbalance) {
            const net = f - b.lambda[m]! * meanUpper - b.extraUptake[m]! * (meanUpper - meanDeep);
            expect(imbalance[m]).toBe(net);
            if (net < nmin) nmin = net;
            if (net > nmax) nmax = net;
          }
        }
        expect(Array.from(x.crossed.subarray(1, 1 + crossings))).toEqual(crossed);
        expect(Array.from(tallies)).toEqual([0, 0, amin, amax, nmin, nmax, above]);
        if (!withImbalance) expect(imbalance.every((v) => v === 0)).toBe(true);
      });
  }
});
