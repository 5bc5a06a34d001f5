import type { CreateModelVersionBody, CreatePathwayBody } from "@plumeline/contracts";

/**
 * Small inputs for the domain tests (not demo data): a 1850–2100 pathway whose CO2 ERF ramps
 * linearly to 4 W m-2 and an aerosol–cloud ERF to −0.8 W m-2, and model assumptions with a
 * few uncertain inputs. Round numbers chosen by hand; nothing here is a published value.
 */
export const TEST_START = 1850;
export const TEST_END = 2100;
const n = TEST_END - TEST_START + 1;
const ramp = (to: number) => Array.from({ length: n }, (_, i) => Math.round((to * i * 1e4) / (n - 1)) / 1e4);

export function testPathwayBody(name = "Test ramp", co2In2100 = 4): CreatePathwayBody {
  return {
    name,
    description: "test fixture",
    source: "hand-made test ramp",
    vintage: "test-1",
    startYear: TEST_START,
    agents: { co2: { erf: ramp(co2In2100) }, "aerosol-cloud": { erf: ramp(-0.8) } },
  };
}

export function testModelVersionBody(overrides: Partial<CreateModelVersionBody> = {}): CreateModelVersionBody {
  return {
    name: "Test assumptions",
    notes: "test fixture",
    model: {
      climate: {
        ecs: { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" },
        f2x: { type: "normal", mean: 3.93, sd: 0.286 },
        upperHeatCapacity: { type: "fixed", value: 7.3 },
        deepHeatCapacity: { type: "fixed", value: 106 },
        heatExchange: { type: "fixed", value: 0.73 },
        deepEfficacy: { type: "fixed", value: 1 },
      },
      agents: { "aerosol-cloud": { scale: { type: "range", p50: 1, low: 0.3, high: 1.7, coverage: 90, shape: "split-normal" } } },
    },
    defaults: { percentiles: [5, 17, 50, 83, 95], thresholds: [1.5, 2, 3], horizons: [2030, 2050, 2100], baseline: [1850, 1900] },
    ...overrides,
  };
}

/** A hand-made peril profile: heavy rainfall at 7 %/K (the Clausius–Clapeyron rate of common practice; region invented). */
export const testRainfallProfileBody = {
  name: "Heavy rainfall, Northmere",
  peril: "flood-heavy-rainfall",
  region: "Northmere Coast",
  metric: "severity",
  baselineWarming: 1.1,
  scaling: { kind: "per-kelvin", rate: { type: "fixed", value: 0.07 } },
} as const;
