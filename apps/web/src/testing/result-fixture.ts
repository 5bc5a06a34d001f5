import type { PathwayResult, Run, RunResult } from "@plumeline/contracts";
import { fanFixture } from "./fixtures";

/**
 * A complete run result around the shared fan fixture (invented numbers, not a model output):
 * every field the result page reads, so a test can render the whole page. Two pathways, the
 * years 2000–2100 by decade, horizons 2050 and 2100, thresholds 1.5 and 2 K.
 */
function pathway(id: string, name: string, offset: number): PathwayResult {
  const f = fanFixture(id, name, offset);
  const n = f.years.length;
  const at = (xs: number[], i: number) => xs[i]!;
  const horizon = (year: number) => {
    const i = f.years.indexOf(year);
    const t = { p5: at(f.p5, i), p17: at(f.p17, i), p50: at(f.p50, i), p83: at(f.p83, i), p95: at(f.p95, i) };
    return {
      year,
      temperature: t,
      exceedance: { "1.5": 0.9, "2": 5e-109 },
      committed: { p5: 0.1, p17: 0.2, p50: 0.3, p83: 0.4, p95: 0.5 },
      precision: { p5: [t.p5 - 0.02, t.p5 + 0.02], p17: null, p50: [t.p50 - 0.01, t.p50 + 0.01], p83: null, p95: null } as Record<string, [number, number] | null>,
      forcing: { p5: 2, p17: 2.5, p50: 3, p83: 3.5, p95: 4 },
      forcingByAgent: { co2: { p5: 2, p50: 2.2, p95: 2.4 }, "aerosol-cloud": { p5: -1, p50: -0.6, p95: -0.2 } },
    };
  };
  const sensitivity = [2050, 2100].flatMap((year) => [
    { input: "ecs", horizon: year, index: 0.8, varianceShare: 0.55 },
    { input: "aerosol-cloud", horizon: year, index: -0.4, varianceShare: 0.2 },
    { input: "f2x", horizon: year, index: 0.1, varianceShare: 0.05 },
  ]);
  return {
    id,
    name,
    years: f.years,
    temperature: { p5: f.p5, p17: f.p17, p50: f.p50, p83: f.p83, p95: f.p95, mean: f.p50 },
    forcing: { p5: f.p5, p17: f.p17, p50: f.p50, p83: f.p83, p95: f.p95 },
    imbalance: { p5: f.p5, p17: f.p17, p50: f.p50, p83: f.p83, p95: f.p95 },
    exceedance: { "1.5": f.years.map((_, i) => i / (n - 1)), "2": f.years.map((_, i) => (i === 0 ? 5e-109 : i / (2 * (n - 1)))) },
    crossing: {
      "1.5": { p5: 2010, p17: 2020, p50: 2030, p83: 2050, p95: null, never: 0.1 },
      "2": { p5: 2030, p17: 2040, p50: 2060, p83: null, p95: null, never: 0.4 },
    },
    horizons: [horizon(2050), horizon(2100)],
    sensitivity,
    effectiveMembers: 1000,
    constraint: null,
  };
}

export function runResultFixture(): RunResult {
  const implied = { p5: 2, p17: 2.5, p50: 3, p83: 3.8, p95: 5 };
  return {
    engineVersion: "0.0.0-fixture",
    inputHash: "in",
    resultHash: "res",
    members: 1000,
    effectiveMembers: 1000,
    implied: { ecs: implied, tcr: { p5: 1.2, p17: 1.5, p50: 1.8, p83: 2.1, p95: 2.4 } },
    pathways: [pathway("middle", "Middle road", 0), pathway("high", "High road", 0.5)],
  };
}

/** The run around it, with only what the result page reads from the run itself. */
export function runFixture(): Run {
  return { id: "run-fixture", manifest: { spec: { baseline: [1850, 1900], model: { constraint: null } } } } as unknown as Run;
}
