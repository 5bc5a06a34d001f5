/**
 * One uncertain input. Identical in shape to the run-spec distribution of the contracts
 * package (the run spec's schema, `runSpecSchema`), re-declared here because the engine library depends
 * on nothing of ours.
 *
 * "range" is how assessment reports publish an input: a median `p50` with a 5–95 %
 * (`coverage: 90`) or 17–83 % (`coverage: 66`) range, fitted as a two-piece lognormal or a
 * two-piece normal (see range.ts).
 */
export type Distribution =
  | { type: "fixed"; value: number }
  | { type: "normal"; mean: number; sd: number }
  | { type: "lognormal"; median: number; logSd: number }
  | { type: "uniform"; min: number; max: number }
  | { type: "triangular"; min: number; mode: number; max: number }
  | { type: "truncated-normal"; mean: number; sd: number; min: number; max: number }
  | {
      type: "range";
      p50: number;
      low: number;
      high: number;
      coverage: 90 | 66;
      shape: "lognormal" | "split-normal";
    };

export type FixedDistribution = Extract<Distribution, { type: "fixed" }>;
export type NormalDistribution = Extract<Distribution, { type: "normal" }>;
export type LognormalDistribution = Extract<Distribution, { type: "lognormal" }>;
export type UniformDistribution = Extract<Distribution, { type: "uniform" }>;
export type TriangularDistribution = Extract<Distribution, { type: "triangular" }>;
export type TruncatedNormalDistribution = Extract<Distribution, { type: "truncated-normal" }>;
export type RangeDistribution = Extract<Distribution, { type: "range" }>;
