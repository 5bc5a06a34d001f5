import { quantile } from "d3-array";
import { describe, expect, it } from "vitest";
import { weightedQuantilesSorted } from "../statistics/weighted-quantile.js";
import { memberTableCsv } from "./member-table-csv.js";
import { memberTable } from "./member-table.js";
import { runEnsemble } from "./run-ensemble.js";
import { baseSpec, rampPathway } from "./test-support/specs.js";

const spec = baseSpec({
  members: 1_001,
  pathways: [rampPathway("high"), { ...rampPathway("low"), agents: { ...rampPathway("low").agents, ozone: { erf: (rampPathway().agents.co2 as { erf: number[] }).erf.map((v) => 0.1 * v) } } }],
});
spec.model.agents = { ...spec.model.agents, ozone: { scale: { type: "normal", mean: 1, sd: 0.3 } }, solar: { scale: { type: "normal", mean: 1, sd: 0.1 } } };

// Ensembles of thousands of members: a generous timeout for a busy shared machine.
describe("memberTable", { timeout: 60_000 }, () => {
  it("lists member, the budget's inputs, weight and <pathway>@<year>; horizon columns give the run's percentiles exactly (d3-array quantile, R type 7)", () => {
    const table = memberTable(spec);
    const result = runEnsemble(spec);
    const inputs = new Set(result.pathways.flatMap((p) => p.sensitivity.map((e) => e.input)));
    const weightAt = table.columns.indexOf("weight");
    expect(new Set(table.columns.slice(1, weightAt))).toEqual(inputs);
    expect(table.columns.slice(weightAt)).toEqual(["weight", "high@2030", "high@2050", "high@2100", "low@2030", "low@2050", "low@2100"]);
    expect(table.columns).not.toContain("solar"); // no pathway carries it: it moves nothing
    expect(Array.from(table.values[0]!.subarray(0, 3))).toEqual([1, 2, 3]);
    expect(table.values[table.columns.indexOf("weight")]!.every((w) => w === 1)).toBe(true);
    for (const pathway of result.pathways)
      for (const horizon of pathway.horizons) {
        const column = Array.from(table.values[table.columns.indexOf(`${pathway.id}@${horizon.year}`)]!);
        for (const [key, value] of Object.entries(horizon.temperature)) expect(quantile(column, Number(key.slice(1)) / 100)).toBe(value);
      }
  });

  it("under a constraint, each pathway's weights give its horizon percentiles by the engine's weighted rule, to rounding", () => {
    const constrained = { ...spec, model: { ...spec.model, constraint: { from: 2011, to: 2020, observed: 1.0, sd: 0.1 } } };
    const table = memberTable(constrained);
    const result = runEnsemble(constrained);
    expect(table.columns.slice(table.columns.indexOf("weight"), table.columns.indexOf("weight") + 3)).toEqual(["weight", "weight@high", "weight@low"]);
    for (const pathway of result.pathways) {
      const weights = table.values[table.columns.indexOf(`weight@${pathway.id}`)]!;
      for (const horizon of pathway.horizons) {
        const column = table.values[table.columns.indexOf(`${pathway.id}@${horizon.year}`)]!;
        const order = Array.from(column.keys()).sort((a, b) => column[a]! - column[b]! || a - b);
        const keys = Object.keys(horizon.temperature);
        // The weighted generalisation of R type 7 stated in statistics/weighted-quantile.ts. The
        // run adds the weights below a member bucket by bucket, this reference member by member:
        // the same rule, summed in another order, so equal to rounding (not bit for bit).
        const expected = weightedQuantilesSorted(order.map((m) => column[m]!), order.map((m) => weights[m]!), keys.map((k) => Number(k.slice(1)) / 100));
        keys.forEach((key, j) => expect(Math.abs(expected[j]! - horizon.temperature[key]!)).toBeLessThan(1e-12));
      }
    }
  });

  it("as CSV reads back to the very same numbers", () => {
    const table = memberTable({ ...spec, members: 50 });
    const lines = memberTableCsv(table).trimEnd().split("\r\n");
    expect(lines[0]).toBe(table.columns.join(","));
    expect(lines).toHaveLength(51);
    lines.slice(1).forEach((line, m) => line.split(",").forEach((cell, j) => expect(Number(cell)).toBe(table.values[j]![m])));
    expect(memberTableCsv({ columns: ['a,"b"'], values: [Float64Array.of(1.5)] })).toBe('"a,""b"""\r\n1.5\r\n');
    expect(() => memberTableCsv({ columns: ["a", "b"], values: [Float64Array.of(1)] })).toThrow("table has 2 column names and 1 columns");
  });
});
