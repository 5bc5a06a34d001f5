import { describe, expect, it } from "vitest";
import { versionStateWhenRunMade } from "./version-status-at-run";

const run = "2026-12-05T12:00:00.000Z";
const before = "2026-12-05T11:00:00.000Z";
const after = "2026-12-05T13:00:00.000Z";

describe("versionStateWhenRunMade", () => {
  it("reads 'in review' for a run made between submission and decision, whatever the version is now", () => {
    expect(versionStateWhenRunMade({ status: "in-review", submittedAt: before, decidedAt: null }, run)).toBe("in review");
    expect(versionStateWhenRunMade({ status: "approved", submittedAt: before, decidedAt: after }, run)).toBe("in review");
  });

  it("reads 'a draft' for a run made before submission, even when the version is in review now", () => {
    expect(versionStateWhenRunMade({ status: "in-review", submittedAt: after, decidedAt: null }, run)).toBe("a draft");
    expect(versionStateWhenRunMade({ status: "draft", submittedAt: null, decidedAt: null }, run)).toBe("a draft");
  });

  it("reads 'rejected' after a rejection, and only 'not approved' while the version is not known", () => {
    expect(versionStateWhenRunMade({ status: "rejected", submittedAt: before, decidedAt: before }, run)).toBe("rejected");
    expect(versionStateWhenRunMade(undefined, run)).toBe("not approved");
  });
});
