import { createRandom, deriveSeed } from "../random/create-random.js";
import { latinHypercube, monteCarloUniforms, imanConover } from "../sampling/index.js";
import { SpecError } from "../spec/spec-error.js";
import type { RunSpec } from "../spec/types.js";
import { columnQuantiles } from "./column-quantiles.js";
import type { ModelInput } from "./uncertain-inputs.js";

export type Allocate = (length: number) => Float64Array;
export const allocateLocal: Allocate = (length) => new Float64Array(length);

/**
 * Draws every member's value of every input: one column per input.
 *
 * Method: each uncertain input gets its own seeded stream (deriveSeed(seed, "input/" + name)),
 * so adding or removing an input never changes the draws of another. Uniforms come from
 * Latin hypercube sampling (McKay et al. 1979) or plain Monte Carlo; inputs named in
 * correlations are then re-paired by Iman–Conover (1982) towards the target rank
 * correlations, which keeps each marginal exactly; finally each uniform goes through the
 * input's inverse CDF. Fixed inputs are a constant column. Cost O(members × inputs).
 */
export function sampleInputs(spec: RunSpec, inputs: ModelInput[], allocate: Allocate = allocateLocal): Float64Array[] {
  const n = spec.members;
  const uniforms = inputs.map((input) => {
    if (input.distribution.type === "fixed") return null;
    const random = createRandom(deriveSeed(spec.seed, `input/${input.name}`));
    const draw = spec.sampling === "latin-hypercube" ? latinHypercube : monteCarloUniforms;
    return draw(n, 1, random)[0]!;
  });
  correlate(spec, inputs, uniforms);
  return inputs.map((input, i) => {
    const column = allocate(n);
    const d = input.distribution;
    if (d.type === "fixed") {
      column.fill(d.value);
      return column;
    }
    columnQuantiles(d, uniforms[i]!, column);
    return column;
  });
}

/** Re-pairs the uniforms of correlated inputs in place by Iman–Conover. */
function correlate(spec: RunSpec, inputs: ModelInput[], uniforms: Array<Float64Array | null>): void {
  const correlations = spec.model.correlations;
  if (correlations.length === 0 || spec.members < 3) return;
  const involved = [...new Set(correlations.flatMap((c) => c.between))].sort(
    (a, b) => inputs.findIndex((x) => x.name === a) - inputs.findIndex((x) => x.name === b),
  );
  const target = involved.map((a) =>
    involved.map((b) => {
      if (a === b) return 1;
      const c = correlations.find((x) => (x.between[0] === a && x.between[1] === b) || (x.between[0] === b && x.between[1] === a));
      return c ? c.rank : 0;
    }),
  );
  const columns = involved.map((name) => uniforms[inputs.findIndex((x) => x.name === name)]!);
  let reordered: Float64Array[];
  try {
    reordered = imanConover(columns, target, createRandom(deriveSeed(spec.seed, "rank-correlation")));
  } catch (error) {
    if (error instanceof RangeError && /positive definite/.test(error.message))
      throw new SpecError(
        "model.correlations",
        `form a rank correlation matrix over ${involved.join(", ")} that is not positive definite: weaken or remove some of them`,
      );
    throw error;
  }
  involved.forEach((name, j) => {
    uniforms[inputs.findIndex((x) => x.name === name)] = reordered[j]!;
  });
}
