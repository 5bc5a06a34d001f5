import { describe, expect, it } from "vitest";
import { baseSpec, fixedClimate, rampPathway } from "../ensemble/test-support/specs.js";
import { MAX_HORIZONS, MAX_PATHWAYS_PER_RUN, MAX_PERCENTILES, MAX_THRESHOLDS, MAX_YEAR, MIN_YEAR } from "./limits.js";
import { SpecError } from "./spec-error.js";
import type { RunSpec } from "./types.js";
import { validateSpec } from "./validate-spec.js";

// The engine's own guard keeps the same bounds as the shared contracts: a library caller
// cannot ask for 17,000 thresholds or 10,040 repeated horizons either.

function refusal(spec: RunSpec): SpecError {
  try {
    validateSpec(spec);
  } catch (error) {
    if (error instanceof SpecError) return error;
    throw error;
  }
  throw new Error("spec was accepted");
}

describe("list bounds and repeats", () => {
  const list = (n: number, from: number, step: number) => Array.from({ length: n }, (_, i) => from + i * step);

  it("refuses more thresholds, horizons, percentiles or pathways than the limit, naming it", () => {
    expect(refusal(baseSpec({ thresholds: list(MAX_THRESHOLDS + 1, 0, 0.1) })).message).toBe(
      `thresholds must list at most ${MAX_THRESHOLDS} values (the limit per run)`,
    );
    expect(refusal(baseSpec({ horizons: list(MAX_HORIZONS + 1, 2000, 1) })).message).toBe(
      `horizons must list at most ${MAX_HORIZONS} values (the limit per run)`,
    );
    expect(refusal(baseSpec({ percentiles: list(MAX_PERCENTILES + 1, 1, 1) })).message).toBe(
      `percentiles must list at most ${MAX_PERCENTILES} values (the limit per run)`,
    );
    const pathways = Array.from({ length: MAX_PATHWAYS_PER_RUN + 1 }, (_, i) => rampPathway(`p${i}`));
    expect(refusal(baseSpec({ pathways })).message).toBe(`pathways must hold at most ${MAX_PATHWAYS_PER_RUN} pathways (the limit per run)`);
  });

  it("refuses repeats, naming both positions", () => {
    expect(refusal(baseSpec({ horizons: [2030, 2050, 2030] })).message).toBe("horizons[2] repeats 2030 (already horizons[0])");
    expect(refusal(baseSpec({ thresholds: [2, 2] })).message).toBe("thresholds[1] repeats 2 (already thresholds[0])");
    expect(refusal(baseSpec({ percentiles: [5, 50, 50] })).message).toBe("percentiles[2] repeats 50 (already percentiles[1])");
  });

  it("refuses implausible pathway years", () => {
    expect(refusal(baseSpec({ pathways: [rampPathway("far", 1e15)] })).message).toBe(
      `pathways[0].startYear must be a year from ${MIN_YEAR} to ${MAX_YEAR}`,
    );
    expect(refusal(baseSpec({ pathways: [rampPathway("late", 2900)] })).message).toBe(
      `pathways[0].startYear with 351 yearly values runs to 3250; years must lie from ${MIN_YEAR} to ${MAX_YEAR}`,
    );
  });
});

describe("fixed physical inputs", () => {
  it("refuses a fixed climate input that is not positive (an ECS of -3 K)", () => {
    const climate = { ...fixedClimate(), ecs: { type: "fixed" as const, value: -3 } };
    const e = refusal(baseSpec({ model: { ...baseSpec().model, climate } }));
    expect(e.message).toBe("model.climate.ecs.value must be > 0 (a physical input)");
  });
});
