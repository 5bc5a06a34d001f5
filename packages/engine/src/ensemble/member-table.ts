import { applyDefaults } from "../spec/apply-defaults.js";
import type { RunSpec, RunSpecInput } from "../spec/types.js";
import { runEnsemble } from "./run-ensemble.js";

/**
 * One row per member, one Float64Array per column, for a validator to recompute any number
 * of a run from its members: `member` (1-based), each uncertain input under its name in the
 * result's `sensitivity[].input` (ecs, f2x, …, agent ids for their scale factors), `weight`,
 * then `<pathwayId>@<year>` per pathway and horizon: that member's warming in K (the
 * year's mean anomaly against the member's own baseline-period mean, as the run reports it).
 */
export interface MemberTable {
  columns: string[];
  values: Float64Array[];
}

/**
 * The member table of a run spec: runs the ensemble exactly as runEnsemble does (same
 * numbers) and lists its members.
 * `weight` holds the first pathway's constraint weights (relative likelihoods, largest 1;
 * all 1 without a constraint). Each pathway is weighted by the likelihood of its own warming
 * over the constraint window, so with a constraint and more than one pathway, columns
 * `weight@<pathwayId>` follow `weight`, one per pathway.
 * The run's horizon percentiles are exactly the R type 7 percentiles of a pathway's horizon
 * column (d3-array `quantile`); with a constraint they are the weighted percentiles of
 * statistics/weighted-quantile.ts over that column and its pathway's weights, to rounding
 * (the run adds the weights below a member bucket by bucket, a plain reading member by
 * member: the same rule summed in another order, ~1e-16 relative).
 * Inputs listed: those with a distribution that is not fixed and that move some pathway's
 * warming (every climate input; an agent's scale if a pathway carries the agent).
 * Cost: one run, plus O(members × columns) to copy.
 */
export function memberTable(input: RunSpec | RunSpecInput): MemberTable {
  const spec = applyDefaults(input);
  const columns: string[] = ["member"];
  const values: Float64Array[] = [];
  const weightColumns: { name: string; values: Float64Array }[] = [];
  const warmingColumns: { name: string; values: Float64Array }[] = [];
  let inputColumns: { name: string; kind: string; values: Float64Array }[] = [];
  let members = 0;
  const carried = new Set<string>();
  runEnsemble(spec, {
    onPathwayMembers: (pathway) => {
      const pathwaySpec = spec.pathways[pathway.pathwayIndex]!;
      const horizons = spec.horizons;
      members = pathway.inputs[0]?.values.length ?? spec.members;
      pathway.agents.forEach((a) => carried.add(a));
      if (pathway.pathwayIndex === 0) inputColumns = pathway.inputs.filter((x) => !x.fixed).map((x) => ({ name: x.name, kind: x.kind, values: x.values.slice() }));
      const weights = pathway.weights ? pathway.weights.slice(0, members) : new Float64Array(members).fill(1);
      weightColumns.push({ name: `weight@${pathwaySpec.id}`, values: weights });
      horizons.forEach((year, h) => warmingColumns.push({ name: `${pathwaySpec.id}@${year}`, values: pathway.horizonWarming[h]!.slice(0, members) }));
    },
  });
  const inputs = inputColumns.filter((x) => x.kind === "climate" || carried.has(x.name));
  const member = new Float64Array(members);
  for (let m = 0; m < members; m++) member[m] = m + 1;
  values.push(member);
  for (const x of inputs) {
    columns.push(x.name);
    values.push(x.values);
  }
  columns.push("weight");
  values.push(weightColumns[0]!.values.slice());
  if (spec.model.constraint !== null && weightColumns.length > 1)
    for (const w of weightColumns) {
      columns.push(w.name);
      values.push(w.values);
    }
  for (const w of warmingColumns) {
    columns.push(w.name);
    values.push(w.values);
  }
  return { columns, values };
}
