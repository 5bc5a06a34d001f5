import { readFileSync } from "node:fs";
import { perilProfilesSchema, portfolioSchema, formatIssues, runSpecSchema } from "@plumeline/contracts";
import { describe, expect, it } from "vitest";
import { demoOrganisation } from "../organisation.js";
import { demoPerilProfiles } from "./demo-peril-profiles.js";
import { demoPortfolio, demoPortfolioCsv } from "./demo-portfolio.js";

describe("demo peril seed", () => {
  it("profiles pass the shared contracts schema", () => {
    const parsed = perilProfilesSchema.safeParse(demoPerilProfiles);
    expect(parsed.success ? [] : formatIssues(parsed.error)).toEqual([]);
  });

  it("portfolio passes the shared contracts schema (ISO 4217 currency, ordered tails, no duplicate rows)", () => {
    const parsed = portfolioSchema.safeParse(demoPortfolio);
    expect(parsed.success ? [] : formatIssues(parsed.error)).toEqual([]);
  });

  it("uses only the invented insurer's regions", () => {
    const regions = new Set<string>(demoOrganisation.regions);
    for (const p of demoPerilProfiles) expect(regions.has(p.region)).toBe(true);
    for (const r of demoPortfolio.rows) expect(regions.has(r.region)).toBe(true);
  });

  it("marks every profile's source, saying in words how sure it is or that it is illustrative", () => {
    for (const p of demoPerilProfiles) expect(p.source).toMatch(/secondary|common practice|from memory|illustrative/i);
  });

  it("ships an upload file identical to the rows", () => {
    const file = readFileSync(new URL("./demo-portfolio.csv", import.meta.url), "utf8");
    expect(file).toBe(demoPortfolioCsv());
  });

  it("fits a run spec as its perils and portfolio", () => {
    const climate = Object.fromEntries(
      ["ecs", "f2x", "upperHeatCapacity", "deepHeatCapacity", "heatExchange", "deepEfficacy"].map((k) => [k, { type: "fixed", value: 1 }]),
    );
    const spec = {
      seed: "demo",
      members: 10,
      sampling: "monte-carlo",
      pathways: [{ id: "p", name: "P", startYear: 1850, agents: { co2: { erf: Array(251).fill(0) } } }],
      model: { climate },
      perils: demoPerilProfiles,
      portfolio: demoPortfolio,
    };
    const parsed = runSpecSchema.safeParse(spec);
    expect(parsed.success ? [] : formatIssues(parsed.error)).toEqual([]);
  });
});
