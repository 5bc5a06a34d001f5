import { perilProfileBodySchema } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { draftFromRecord, emptyDraft, toProfileBody } from "./profile-draft";

describe("profile drafts", () => {
  it("turns rates typed in % per K into fractions (7 -> 0.07) and back without binary noise", () => {
    const draft = { ...emptyDraft(), name: "Flood", region: "North" };
    const out = toProfileBody(draft);
    expect(out.body?.scaling).toEqual({ kind: "per-kelvin", rate: { type: "range", p50: 0.07, low: 0.05, high: 0.09, coverage: 90, shape: "split-normal" } });
    const back = draftFromRecord({ ...perilProfileBodySchema.parse(out.body!), source: undefined });
    expect(back.rate).toEqual({ p50: "7", low: "5", high: "9" });
  });

  it("keeps a lognormal's log-sd as typed (not a rate)", () => {
    const out = toProfileBody({ ...emptyDraft(), rateType: "lognormal", rate: { median: "7", logSd: "0.2" } });
    expect(out.body?.scaling).toEqual({ kind: "per-kelvin", rate: { type: "lognormal", median: 0.07, logSd: 0.2 } });
  });

  it("names every field that is not a number with its API path", () => {
    const out = toProfileBody({
      ...emptyDraft(),
      baselineWarming: "1,1",
      kind: "table",
      tables: [{ returnPeriod: "1 in 10", points: [{ warming: "1", multiplier: "" }, { warming: "x", multiplier: "2" }] }],
    });
    expect(out.errors).toEqual({
      baselineWarming: "must be a number",
      "scaling.tables[0].returnPeriod": "must be a number",
      "scaling.tables[0].points[0].multiplier": "must be a number",
      "scaling.tables[0].points[1].warming": "must be a number",
    });
  });

  it("round-trips a table profile with tables for two return periods", () => {
    // IPCC AR6 WGI SPM Figure SPM.6 at 0 and 1 °C: 10-year hot extremes 2.8 times per 10 years, 50-year ones 4.8 times per 50 years.
    const record = {
      name: "Heat",
      peril: "heat",
      region: "Vellan",
      metric: "frequency" as const,
      baselineWarming: 1.1,
      source: "SPM.6",
      scaling: {
        kind: "table" as const,
        tables: [
          { returnPeriod: 10, points: [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 2.8 }] },
          { returnPeriod: 50, points: [{ warming: 0, multiplier: 1 }, { warming: 1, multiplier: 4.8 }] },
        ],
        beyondTable: "extrapolate" as const,
        beyondReturnPeriods: "hold" as const,
      },
    };
    expect(toProfileBody(draftFromRecord(record)).body).toEqual(record);
  });
});
