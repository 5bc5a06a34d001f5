import type { Run } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { compareSettings } from "./compare-settings";

function run(over: Partial<Run> & { constraint?: unknown; versionNumber?: number }): Run {
  return {
    id: "r",
    name: "r",
    exploratory: false,
    modelVersion: { id: "v", name: "Core", versionNumber: over.versionNumber ?? 1, status: "approved" },
    members: 4000,
    seed: "s1",
    sampling: "latin-hypercube",
    manifest: {
      engineVersion: "0.3.0",
      inputHash: "i",
      resultHash: "h",
      spec: { baseline: [1850, 1900], model: { constraint: over.constraint ?? null } },
      pathways: [{ id: "p", name: "Middle", checksum: "c", source: "s", vintage: "v" }],
    },
    ...over,
  } as Run;
}

describe("compareSettings", () => {
  it("marks exactly the settings that differ", () => {
    const rows = compareSettings([
      run({}),
      run({ versionNumber: 2, seed: "s2" }),
      run({ constraint: { from: 2001, to: 2020, observed: 1, sd: 0.1 } }),
    ]);
    const differing = rows.filter((r) => r.differs).map((r) => r.name);
    expect(differing).toEqual(["Model version", "Seed", "Constraint"]);
    expect(rows.find((r) => r.name === "Model version")!.values).toEqual(["Core v1", "Core v2", "Core v1"]);
    expect(rows.find((r) => r.name === "Constraint")!.values[2]).toBe("observed 1 ± 0.1 K over 2001–2020");
    expect(rows.find((r) => r.name === "Members")!.values).toEqual(["4,000", "4,000", "4,000"]);
  });
});
