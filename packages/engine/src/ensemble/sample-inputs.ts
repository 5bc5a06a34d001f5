import { AleaStream } from "../random/alea-stream.js";
import { createRandom, deriveSeed } from "../random/create-random.js";
import { imanConover, latinHypercubeColumnInto } from "../sampling/index.js";
import { SpecError } from "../spec/spec-error.js";
import type { RunSpec } from "../spec/types.js";
import { columnQuantiles } from "./column-quantiles.js";
import type { ModelInput } from "./uncertain-inputs.js";

export type Allocate = (length: number) => Float64Array;
export const allocateLocal: Allocate = (length) => new Float64Array(length);

/*
 * Draws every member's value of every input: one column per input.
 *
 * Method: each uncertain input gets its own seeded stream (deriveSeed(seed, "input/" + name)),
 * so adding or removing an input never changes the draws of another. Uniforms come from
 * Latin hypercube sampling (McKay et al. 1979) or plain Monte Carlo; inputs named in
 * correlations are then re-paired by Iman–Conover (1982) towards the target rank
 * correlations, which keeps each marginal exactly; finally each uniform goes through the
 * input's inverse CDF. Fixed inputs are a constant column. Cost O(members × inputs).
 *
 * The work comes as jobs (samplingJobs), each filling one or two columns straight into
 * their (possibly shared) arrays from their own streams. A job depends on nothing but the
 * spec and its inputs, so jobs may run in any order, on any thread, with the same numbers;
 * correlateColumns then needs every job done. Monte Carlo columns are drawn two at a time
 * (AleaStream.fillTwo: the same draws, ~2× faster than one stream after the other).
 */

/**
 * The sampling jobs of a spec: lists of input indices. Monte Carlo pairs the uncertain
 * inputs in input order (the last one alone if their number is odd); Latin hypercube draws
 * each column on its own; each fixed input is a job of its own.
 */
export function samplingJobs(spec: RunSpec, inputs: ModelInput[]): number[][] {
  const uncertain = inputs.flatMap((input, i) => (input.distribution.type === "fixed" ? [] : [i]));
  const fixed = inputs.flatMap((input, i) => (input.distribution.type === "fixed" ? [[i]] : []));
  if (spec.sampling !== "monte-carlo") return [...uncertain.map((i) => [i]), ...fixed];
  const pairs: number[][] = [];
  for (let k = 0; k < uncertain.length; k += 2) pairs.push(uncertain.slice(k, k + 2));
  return [...pairs, ...fixed];
}

/**
 * Runs one sampling job: fills the columns of inputs `job` (samplingJobs) with their draws,
 * mapped through each input's inverse CDF unless the input is correlated (correlateColumns
 * maps those after re-pairing). With `memory` (the kernel memory the columns live in), Monte
 * Carlo uniforms are drawn by the random kernels: the same draws, faster in a fresh process.
 */
export function runSamplingJob(
  spec: RunSpec,
  inputs: ModelInput[],
  columns: Float64Array[],
  correlated: number[],
  job: number[],
  memory?: WebAssembly.Memory,
): void {
  const streams = job.map((i) =>
    inputs[i]!.distribution.type === "fixed" ? null : new AleaStream(deriveSeed(spec.seed, `input/${inputs[i]!.name}`)),
  );
  if (spec.sampling === "monte-carlo") {
    const [a, b] = [columns[job[0]!]!, job.length === 2 ? columns[job[1]!]! : null];
    if (b && memory) AleaStream.fillTwoInMemory(streams[0]!, a, streams[1]!, b, memory);
    else if (b) AleaStream.fillTwo(streams[0]!, a, streams[1]!, b);
    else if (memory) streams[0]?.fillInMemory(a, memory);
    else streams[0]?.fill(a);
  }
  job.forEach((i, k) => sampleColumn(spec, inputs[i]!, columns[i]!, streams[k]!, correlated.includes(i)));
}

/**
 * Indices of the inputs Iman–Conover re-pairs: those named in correlations, in input order
 * (none when there are no correlations or fewer than 3 members).
 */
export function correlatedInputs(spec: RunSpec, inputs: ModelInput[]): number[] {
  const correlations = spec.model.correlations;
  if (correlations.length === 0 || spec.members < 3) return [];
  const named = new Set(correlations.flatMap((c) => c.between));
  return inputs.flatMap((input, i) => (named.has(input.name) ? [i] : []));
}

/**
 * Fills one input's column from the input's own stream (null for a fixed input): its
 * uniforms (Monte Carlo ones are already drawn), mapped through the inverse CDF in place
 * unless `uniformsOnly` (a correlated input: correlateColumns maps it after re-pairing).
 * Depends on nothing but the spec and the input, so columns can be sampled in any order,
 * on any thread.
 */
function sampleColumn(spec: RunSpec, input: ModelInput, column: Float64Array, stream: AleaStream | null, uniformsOnly: boolean): void {
  const d = input.distribution;
  if (d.type === "fixed" || stream === null) {
    if (d.type === "fixed") column.fill(d.value);
    return;
  }
  if (spec.sampling === "latin-hypercube") latinHypercubeColumnInto(column, () => stream.next());
  if (!uniformsOnly) columnQuantiles(d, column, column);
}

/**
 * Re-pairs the uniforms held in the correlated columns by Iman–Conover, then maps each
 * through its input's inverse CDF, in place. Needs every correlated column drawn.
 */
export function correlateColumns(spec: RunSpec, inputs: ModelInput[], columns: Float64Array[], correlated: number[]): void {
  if (correlated.length === 0) return;
  const correlations = spec.model.correlations;
  const involved = correlated.map((i) => inputs[i]!.name);
  const target = involved.map((a) =>
    involved.map((b) => {
      if (a === b) return 1;
      const c = correlations.find((x) => (x.between[0] === a && x.between[1] === b) || (x.between[0] === b && x.between[1] === a));
      return c ? c.rank : 0;
    }),
  );
  let reordered: Float64Array[];
  try {
    reordered = imanConover(
      correlated.map((i) => columns[i]!),
      target,
      createRandom(deriveSeed(spec.seed, "rank-correlation")),
    );
  } catch (error) {
    if (error instanceof RangeError && /positive definite/.test(error.message))
      throw new SpecError(
        "model.correlations",
        `form a rank correlation matrix over ${involved.join(", ")} that is not positive definite: weaken or remove some of them`,
      );
    throw error;
  }
  correlated.forEach((i, j) => columnQuantiles(inputs[i]!.distribution, reordered[j]!, columns[i]!));
}
