import type { RunSpec } from "../spec/types.js";

/**
 * Benchmark workload W1 (bench-reference/README.md) as an ordinary run spec, so the bench
 * goes through the engine's real code path: 351 years 1750–2100, eight agents with base
 * series amp[k]·(t/350)^(2.5 + 0.3k) and Normal(1, sd[k]) scales, ECS lognormal (median 3,
 * log-sd 0.3039), F2x Normal(3.93, 0.24), and the four ocean inputs. W1 clips the normal
 * ocean inputs below (e.g. max(3, Normal(8, 1))); the spec language has truncated normals
 * instead, which differ only in the clipped mass: at most 2·10⁻⁴ of members (efficacy
 * below 0.5), far below the check value's sampling noise (standard deviation about 0.7 at 100,000 members). Plain Monte Carlo,
 * as the reference programs draw.
 */
const AMPLITUDES = [2.2, 0.6, 0.25, 0.4, 0.45, -0.35, -1.0, -0.2];
const SCALE_SDS = [0.1, 0.2, 0.15, 0.3, 0.5, 0.5, 0.7, 0.5];
const AGENTS = ["co2", "ch4", "n2o", "other-wmghg", "ozone", "aerosol-radiation", "aerosol-cloud", "land-use"] as const;
const YEARS = 351;

/** Normal(mean, sd) clipped below at `min`, written as a normal truncated at min and mean + 50 sd. */
function clippedNormal(mean: number, sd: number, min: number) {
  return { type: "truncated-normal" as const, mean, sd, min, max: mean + 50 * sd };
}

export function w1Spec(members: number, seed = "w1"): RunSpec {
  const agents: RunSpec["pathways"][number]["agents"] = {};
  const scales: RunSpec["model"]["agents"] = {};
  AGENTS.forEach((agent, k) => {
    const erf = Array.from({ length: YEARS }, (_, t) => AMPLITUDES[k]! * (t / (YEARS - 1)) ** (2.5 + 0.3 * k));
    agents[agent] = { erf };
    scales[agent] = { scale: { type: "normal", mean: 1, sd: SCALE_SDS[k]! } };
  });
  return {
    seed,
    members,
    sampling: "monte-carlo",
    baseline: [1850, 1900],
    percentiles: [5, 17, 50, 83, 95],
    thresholds: [1.5],
    horizons: [],
    pathways: [{ id: "w1", name: "Benchmark workload W1", startYear: 1750, agents }],
    model: {
      climate: {
        ecs: { type: "lognormal", median: 3, logSd: 0.3039 },
        f2x: { type: "normal", mean: 3.93, sd: 0.24 },
        upperHeatCapacity: clippedNormal(8, 1, 3),
        deepHeatCapacity: clippedNormal(100, 20, 20),
        heatExchange: clippedNormal(0.7, 0.1, 0.2),
        deepEfficacy: clippedNormal(1.2, 0.2, 0.5),
      },
      agents: scales,
      correlations: [],
      constraint: null,
      forcingExpression: "ar6",
    },
  };
}
