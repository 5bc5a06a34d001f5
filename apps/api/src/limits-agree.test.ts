import * as contracts from "@plumeline/contracts";
import * as engine from "@plumeline/engine";
import { describe, expect, it } from "vitest";

// The engine library imports nothing of ours, so it restates the limits the shared contracts
// state (run size, lists, years, peril lens ranges). The API is where both meet: a request
// the contracts let through must not be refused by the engine, nor the other way round.
const RUN_LIMITS = [
  "MAX_MEMBERS",
  "MAX_PATHWAY_YEARS",
  "MAX_THRESHOLDS",
  "MAX_HORIZONS",
  "MAX_PERCENTILES",
  "MAX_PATHWAYS_PER_RUN",
  "MIN_YEAR",
  "MAX_YEAR",
] as const;
const PERIL_LIMITS = ["BASELINE_WARMING_RANGE", "BASELINE_RETURN_PERIODS", "LEGACY_TABLE_RETURN_PERIOD"] as const;

describe("engine and contracts limits", () => {
  it.each([...RUN_LIMITS, ...PERIL_LIMITS])("%s is the same number in both", (name) => {
    expect(engine[name]).toBeDefined();
    expect(engine[name]).toEqual(contracts[name]);
  });
});
