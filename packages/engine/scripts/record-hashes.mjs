// Prints the resultHash of a fixed set of specs with 1, 2 and 3 threads, for checking that an
// engine change leaves every number bit for bit as it was (compare two runs' output with diff).
// Usage: node scripts/record-hashes.mjs   (needs a built dist: pnpm build)
import { runEnsembleParallel } from "../dist/node/index.js";
import { w1Spec } from "../dist/bench/w1-spec.js";

const ramp = (id, startYear, years, agents) => ({
  id, name: id, startYear,
  agents: Object.fromEntries(agents.map((a, k) => [a, { erf: Array.from({ length: years }, (_, t) => (k % 2 ? -0.4 : 1.3) * (t / (years - 1)) ** (2 + 0.25 * k)) }])),
});
const manyAgents = ["co2", "ch4", "n2o", "other-wmghg", "ozone", "aerosol-radiation", "aerosol-cloud", "land-use", "volcanic", "solar"];
const mixed = (members, withConstraint) => ({
  seed: "hash-check", members, sampling: "latin-hypercube", baseline: [1850, 1900],
  percentiles: [5, 17, 50, 83, 95], thresholds: [1.5, 2, 3], horizons: [2030, 2050, 2100],
  pathways: [ramp("wide", 1750, 351, manyAgents), ramp("narrow", 1800, 301, ["co2", "aerosol-cloud", "ozone"])],
  model: {
    climate: {
      ecs: { type: "lognormal", median: 3, logSd: 0.3 }, f2x: { type: "normal", mean: 3.93, sd: 0.24 },
      upperHeatCapacity: { type: "truncated-normal", mean: 8, sd: 1, min: 3, max: 20 },
      deepHeatCapacity: { type: "truncated-normal", mean: 100, sd: 20, min: 20, max: 300 },
      heatExchange: { type: "truncated-normal", mean: 0.7, sd: 0.1, min: 0.2, max: 2 },
      deepEfficacy: { type: "truncated-normal", mean: 1.2, sd: 0.2, min: 0.5, max: 3 },
    },
    agents: Object.fromEntries(manyAgents.slice(0, 9).map((a, k) => [a, { scale: { type: "normal", mean: 1, sd: 0.1 + 0.05 * k } }])),
    correlations: [{ between: ["ecs", "aerosol-cloud"], rank: -0.4 }, { between: ["co2", "ozone"], rank: 0.3 }],
    constraint: withConstraint ? { from: 2011, to: 2020, observed: 1.0, sd: 0.1 } : null,
    forcingExpression: "ar6",
  },
});
// Pathways that alternate between CO2 as ERF and CO2 in ppm: the member climate is rebuilt
// for each change of source of F2x (ensemble-plan.ts climate).
const alternating = (members) => {
  const spec = mixed(members, true);
  const ppm = (p) => ({ ...p, agents: { ...p.agents, co2: { ppm: Array.from({ length: p.agents.co2.erf.length }, (_, t) => 278 + 400 * (t / (p.agents.co2.erf.length - 1)) ** 2.5) } } });
  const [wide, narrow] = spec.pathways;
  return { ...spec, pathways: [wide, ppm({ ...narrow, id: "narrow-ppm" }), { ...narrow, id: "narrow-erf" }, ppm({ ...wide, id: "wide-ppm" })] };
};
const cases = [
  ["w1 5000", w1Spec(5000)], ["w1 30001", w1Spec(30001)],
  ["mixed 5001", mixed(5001, false)], ["mixed 30000 constrained", mixed(30000, true)],
  ["alternating co2 sources 20000 constrained", alternating(20000)],
];
for (const [name, spec] of cases)
  for (const summaries of [{}, { forcing: false, imbalance: false }])
    for (const threads of [1, 2, 3]) {
      const r = await runEnsembleParallel(spec, { threads, summaries });
      console.log(name, JSON.stringify(summaries), threads, r.resultHash);
    }
