import { describe, expect, it } from "vitest";
import { diffModelVersions } from "./model-version-diff.js";

// Expected changes are worked out by hand from the two documents in each case.
describe("diffModelVersions", () => {
  const base = {
    name: "Core",
    model: {
      climate: { ecs: { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" } },
      correlations: [{ between: ["ecs", "aerosol-cloud"], rank: -0.3 }],
    },
    defaults: { percentiles: [5, 50, 95], horizons: [2050, 2100] },
  };

  it("returns no changes for equal documents", () => {
    expect(diffModelVersions(base, structuredClone(base))).toEqual([]);
  });

  it("names a changed field by its path", () => {
    const next = structuredClone(base);
    next.model.climate.ecs.high = 5.5;
    expect(diffModelVersions(base, next)).toEqual([{ path: "model.climate.ecs.high", before: 5, after: 5.5 }]);
  });

  it("reports a distribution whose type changed as one change", () => {
    const next = structuredClone(base) as unknown as { model: { climate: { ecs: unknown } } };
    next.model.climate.ecs = { type: "fixed", value: 3 };
    expect(diffModelVersions(base, next)).toEqual([
      { path: "model.climate.ecs", before: base.model.climate.ecs, after: { type: "fixed", value: 3 } },
    ]);
  });

  it("compares plain lists whole and object lists by element; missing sides are null", () => {
    const next = structuredClone(base) as typeof base & { notes?: string };
    next.defaults.percentiles = [5, 17, 50, 83, 95];
    next.model.correlations[0]!.rank = -0.5;
    next.notes = "tightened";
    expect(diffModelVersions(base, next)).toEqual([
      { path: "defaults.percentiles", before: [5, 50, 95], after: [5, 17, 50, 83, 95] },
      { path: "model.correlations[0].rank", before: -0.3, after: -0.5 },
      { path: "notes", before: null, after: "tightened" },
    ]);
  });
});
