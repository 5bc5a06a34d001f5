import seedrandom from "seedrandom";
import { randomKernels } from "../kernels/random-kernels.js";

/**
 * Draws per call of a random kernel. V8 first runs WebAssembly through its baseline compiler
 * and swaps in optimised code only for later calls of a function (a call under way finishes
 * where it began), so one call per 100,000-member column ran wholly unoptimised in a fresh
 * process; calls of this size let the later ones use the optimised loop. The stream's state
 * carries from call to call: the same draws.
 */
const KERNEL_CALL_DRAWS = 8192;

/** Alea's state in seedrandom's naming: carry c and the three lagged values s0, s1, s2. */
export interface AleaState {
  c: number;
  s0: number;
  s1: number;
  s2: number;
}

/** 2^-32 and 2^-53, the constants of seedrandom's Alea (lib/alea.js). */
const TWO_POW_MINUS_32 = 2.3283064365386963e-10;
const TWO_POW_MINUS_53 = 1.1102230246251565e-16;

/**
 * Baagøe's Alea generator, seeded by seedrandom 3.0.5 and then stepped here with the state in
 * a Float64Array, giving exactly seedrandom's `alea(seed).double()` stream with zeros skipped.
 *
 * Why not call seedrandom per draw: each Alea step waits for the previous one's carry, so one
 * stream leaves the core mostly idle; only with the state in local variables can two
 * independent streams be interleaved (fillTwo, about 2× faster). One stream alone is no
 * faster here than seedrandom once V8 has optimised both (14 columns of 100,000: 17–20 ms
 * either way), but in a fresh process, where a run's sampling starts cold, this loop took
 * 36–52 ms against seedrandom's 47–59 ms (measured 2026-12-05, loaded machine). The seeding (Mash over the seed string) stays the library's own: the state is
 * read once through its documented `{ state: true }` option. Every step is the library's
 * expression in the library's order, so every draw is bit for bit the same (tested against
 * seedrandom itself).
 *
 * Method: multiply-with-carry lag-3 recurrence t = 2091639·s0 + c·2^-32, then s0 ← s1,
 * s1 ← s2, c ← ⌊t⌋, s2 ← t − c. A draw is hi + ⌊lo·2^21⌋·2^-53 from two steps (53 bits).
 * Reference: J. Baagøe (2010), "Better random numbers for JavaScript"; seedrandom 3.0.5,
 * lib/alea.js.
 */
export class AleaStream {
  /** c, s0, s1, s2. */
  private readonly state = new Float64Array(4);

  /** From a seed (seedrandom's seeding), or from a state as seedrandom's `state()` gives it. */
  constructor(seed: string | AleaState) {
    const seeded = typeof seed === "string" ? seedrandom.alea(seed, { state: true }).state() : seed;
    this.state[0] = seeded.c;
    this.state[1] = seeded.s0;
    this.state[2] = seeded.s1;
    this.state[3] = seeded.s2;
  }

  /** The next draw on the open interval (0, 1): seedrandom's double(), redrawn while it is 0. */
  next(): number {
    const state = this.state;
    let c = state[0]!;
    let s0 = state[1]!;
    let s1 = state[2]!;
    let s2 = state[3]!;
    let u: number;
    do {
      let t = 2091639 * s0 + c * TWO_POW_MINUS_32;
      s0 = s1;
      s1 = s2;
      c = t | 0;
      s2 = t - c;
      const hi = s2;
      t = 2091639 * s0 + c * TWO_POW_MINUS_32;
      s0 = s1;
      s1 = s2;
      c = t | 0;
      s2 = t - c;
      u = hi + ((s2 * 0x200000) | 0) * TWO_POW_MINUS_53;
    } while (u <= 0);
    state[0] = c;
    state[1] = s0;
    state[2] = s1;
    state[3] = s2;
    return u;
  }

  /**
   * fill() of two streams at once: a.fill(outA) and b.fill(outB) for outA.length (= outB.length)
   * draws, the same numbers. Why: each Alea step waits for the one before it (the carry),
   * so one stream keeps the core mostly idle; two independent streams interleaved run
   * ~2.3× as many draws per second (measured, 14 columns of 100,000: 21 → 9 ms warm).
   */
  static fillTwo(a: AleaStream, outA: Float64Array, b: AleaStream, outB: Float64Array): void {
    const n = outA.length;
    if (outB.length !== n) throw new RangeError("outB must be as long as outA");
    const stateA = a.state;
    const stateB = b.state;
    let c = stateA[0]!;
    let s0 = stateA[1]!;
    let s1 = stateA[2]!;
    let s2 = stateA[3]!;
    let d = stateB[0]!;
    let r0 = stateB[1]!;
    let r1 = stateB[2]!;
    let r2 = stateB[3]!;
    for (let i = 0; i < n; i++) {
      let t = 2091639 * s0 + c * TWO_POW_MINUS_32;
      s0 = s1;
      s1 = s2;
      c = t | 0;
      s2 = t - c;
      const hiA = s2;
      let q = 2091639 * r0 + d * TWO_POW_MINUS_32;
      r0 = r1;
      r1 = r2;
      d = q | 0;
      r2 = q - d;
      const hiB = r2;
      t = 2091639 * s0 + c * TWO_POW_MINUS_32;
      s0 = s1;
      s1 = s2;
      c = t | 0;
      s2 = t - c;
      q = 2091639 * r0 + d * TWO_POW_MINUS_32;
      r0 = r1;
      r1 = r2;
      d = q | 0;
      r2 = q - d;
      let u = hiA + ((s2 * 0x200000) | 0) * TWO_POW_MINUS_53;
      let v = hiB + ((r2 * 0x200000) | 0) * TWO_POW_MINUS_53;
      if (u <= 0 || v <= 0) {
        // A draw of exactly 0 (probability 2^-53): that stream redraws, as next() does.
        stateA.set([c, s0, s1, s2]);
        stateB.set([d, r0, r1, r2]);
        if (u <= 0) u = a.next();
        if (v <= 0) v = b.next();
        c = stateA[0]!;
        s0 = stateA[1]!;
        s1 = stateA[2]!;
        s2 = stateA[3]!;
        d = stateB[0]!;
        r0 = stateB[1]!;
        r1 = stateB[2]!;
        r2 = stateB[3]!;
      }
      outA[i] = u;
      outB[i] = v;
    }
    stateA[0] = c;
    stateA[1] = s0;
    stateA[2] = s1;
    stateA[3] = s2;
    stateB[0] = d;
    stateB[1] = r0;
    stateB[2] = r1;
    stateB[3] = r2;
  }

  /**
   * fill(out) for a column of a kernel memory (kernels/kernel-memory.ts), by the random kernels
   * (kernels/random-kernels.wat): the same draws, without the unoptimised JavaScript's boxed
   * doubles in a fresh process.
   */
  fillInMemory(out: Float64Array, memory: WebAssembly.Memory): void {
    const s = this.state;
    const kernels = randomKernels(memory);
    for (let from = 0; from < out.length; from += KERNEL_CALL_DRAWS) {
      const n = Math.min(KERNEL_CALL_DRAWS, out.length - from);
      s.set(kernels.fill(out.byteOffset + 8 * from, n, s[0]!, s[1]!, s[2]!, s[3]!));
    }
  }

  /** fillTwo for two columns of one kernel memory, by the random kernels (as fillInMemory). */
  static fillTwoInMemory(a: AleaStream, outA: Float64Array, b: AleaStream, outB: Float64Array, memory: WebAssembly.Memory): void {
    if (outB.length !== outA.length) throw new RangeError("outB must be as long as outA");
    const [p, q] = [a.state, b.state];
    const kernels = randomKernels(memory);
    for (let from = 0; from < outA.length; from += KERNEL_CALL_DRAWS) {
      const n = Math.min(KERNEL_CALL_DRAWS, outA.length - from);
      const next = kernels.fillTwo(outA.byteOffset + 8 * from, outB.byteOffset + 8 * from, n, p[0]!, p[1]!, p[2]!, p[3]!, q[0]!, q[1]!, q[2]!, q[3]!);
      p.set(next.slice(0, 4));
      q.set(next.slice(4));
    }
  }

  /** out[from … to) ← the next draws in order, as that many next() calls would give them. */
  fill(out: Float64Array, from = 0, to = out.length): void {
    const state = this.state;
    let c = state[0]!;
    let s0 = state[1]!;
    let s1 = state[2]!;
    let s2 = state[3]!;
    for (let i = from; i < to; i++) {
      let u: number;
      do {
        let t = 2091639 * s0 + c * TWO_POW_MINUS_32;
        s0 = s1;
        s1 = s2;
        c = t | 0;
        s2 = t - c;
        const hi = s2;
        t = 2091639 * s0 + c * TWO_POW_MINUS_32;
        s0 = s1;
        s1 = s2;
        c = t | 0;
        s2 = t - c;
        u = hi + ((s2 * 0x200000) | 0) * TWO_POW_MINUS_53;
      } while (u <= 0);
      out[i] = u;
    }
    state[0] = c;
    state[1] = s0;
    state[2] = s1;
    state[3] = s2;
  }
}
