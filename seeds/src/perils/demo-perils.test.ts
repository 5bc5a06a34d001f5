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

  it("names every profile's published source or says it is illustrative, without notes-file tags", () => {
    for (const p of demoPerilProfiles) {
      expect(p.source).toMatch(/IPCC|illustrative/i);
      // How sure, in words.
      expect(p.source).toMatch(/secondary|reproductions|common practice|from memory|illustrative/i);
      expect(p.source).not.toMatch(/\[read-|\[memory\]|§\d/);
    }
  });

  it("gives the heat profile AR6 SPM.6's hot-extreme frequencies for 10-year and 50-year events", () => {
    // IPCC AR6 WGI SPM Figure SPM.6 (read in reproductions of the figure): times per 10 years of a
    // 10-year hot extreme and times per 50 years of a 50-year one, at 1 / 1.5 / 2 / 4 °C.
    const heat = perilProfilesSchema.parse(demoPerilProfiles).find((p) => p.peril === "heat")!;
    if (heat.scaling.kind !== "table") throw new Error("the demo heat profile must be a table");
    const byPeriod = Object.fromEntries(heat.scaling.tables.map((t) => [t.returnPeriod, t.points.map((p) => [p.warming, p.multiplier])]));
    expect(byPeriod).toEqual({
      10: [[0, 1], [1, 2.8], [1.5, 4.1], [2, 5.6], [4, 9.4]],
      50: [[0, 1], [1, 4.8], [1.5, 8.6], [2, 13.9], [4, 39.2]],
    });
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
