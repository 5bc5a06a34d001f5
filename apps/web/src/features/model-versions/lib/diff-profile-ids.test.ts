import { describe, expect, it } from "vitest";
import type { ModelVersionDiff } from "@plumeline/contracts";
import { diffProfileIds } from "./diff-profile-ids";

const diff = (changes: ModelVersionDiff["changes"]): ModelVersionDiff => ({
  against: { id: "mv-1", name: "Core", versionNumber: 1 },
  changes,
});

describe("diffProfileIds", () => {
  it("names the profiles on both sides of a pinned-profile change, and none when the pins did not change", () => {
    expect(diffProfileIds(diff([{ path: "perilProfileIds", before: ["pp-a"], after: ["pp-a", "pp-b"] }]))).toEqual([
      "pp-a",
      "pp-a",
      "pp-b",
    ]);
    expect(diffProfileIds(diff([{ path: "model.climate.ecs.median", before: 3, after: 3.2 }]))).toEqual([]);
    expect(diffProfileIds(diff([{ path: "perilProfileIds", before: null, after: ["pp-c"] }]))).toEqual(["pp-c"]);
    expect(diffProfileIds(undefined)).toEqual([]);
  });
});
