import { describe, expect, it } from "vitest";
import { newStepDraft, parseStepDraft, referencedPathwayIds, type StepDraft } from "./compose-step-draft";

// Invented pathway 2000–2009 with two agents.
const current = {
  startYear: 2000,
  agents: { ozone: { erf: Array(10).fill(0.3) as number[] }, co2: { ppm: Array(10).fill(400) as number[] } },
};

describe("compose step drafts", () => {
  it("new steps start from the pathway they apply to: its first agent (contract order), its years, and a fit window no longer than it", () => {
    expect(newStepDraft("scale", current)).toMatchObject({ kind: "scale", agent: "co2", factor: "1", fromYear: "2000", toYear: "2009" });
    expect(newStepDraft("extend", current)).toMatchObject({ kind: "extend", toYear: "2059", method: "hold", fitYears: "10" });
    expect(newStepDraft("blend", current, "p2")).toMatchObject({ kind: "blend", otherPathwayId: "p2", weight: "0.5" });
  });

  it("parses typed boxes into a checked step; empty optional years stay out", () => {
    const draft: StepDraft = { key: "k", kind: "scale", agent: "ozone", factor: " 1.5 ", fromYear: "", toYear: "2005" };
    expect(parseStepDraft(draft)).toEqual({ ok: true, step: { kind: "scale", agent: "ozone", factor: 1.5, toYear: 2005 } });
  });

  it("names each bad box: text where a number belongs, a weight above 1, a missing fit window", () => {
    expect(parseStepDraft({ key: "k", kind: "scale", agent: "ozone", factor: "two", fromYear: "20x0", toYear: "" })).toEqual({
      ok: false,
      errors: { factor: "must be a number", fromYear: "must be a year" },
    });
    expect(parseStepDraft({ key: "k", kind: "blend", otherPathwayId: "p", weight: "1.2" })).toEqual({
      ok: false,
      errors: { weight: "must lie from 0 to 1" },
    });
    expect(parseStepDraft({ key: "k", kind: "blend", otherPathwayId: "", weight: "0.5" })).toEqual({
      ok: false,
      errors: { otherPathwayId: "must name a pathway" },
    });
    const linear = parseStepDraft({ key: "k", kind: "extend", toYear: "2100", method: "linear", fitYears: "" });
    expect(!linear.ok && linear.errors.fitYears).toMatch(/^must be given for a linear trend/);
  });

  it("lists the other pathways the steps read, once each", () => {
    const drafts: StepDraft[] = [
      { key: "a", kind: "splice", agent: "co2", sourcePathwayId: "p2", fromYear: "2000", toYear: "2001" },
      { key: "b", kind: "blend", otherPathwayId: "p2", weight: "0.5" },
      { key: "c", kind: "blend", otherPathwayId: "", weight: "0.5" },
      { key: "d", kind: "extend", toYear: "2100", method: "hold", fitYears: "30" },
    ];
    expect(referencedPathwayIds(drafts)).toEqual(["p2"]);
  });
});
