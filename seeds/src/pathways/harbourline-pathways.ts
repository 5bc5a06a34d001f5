import type { ForcingAgent } from "@plumeline/contracts";
import { AR6_CONCENTRATIONS, AR6_ERF_2019, AR6_OTHER_PARTS_2019, AR6_SOURCE_NOTE, OTHER_AGENT_NOTE } from "./ar6-anchors.js";
import { acceleratingRise, easeInOut, logisticRise, round, yearsBetween } from "./shapes.js";

/** A demo pathway as the API's create body takes it (POST /api/pathways). */
export interface DemoPathway {
  key: "harbourline-low" | "harbourline-middle" | "harbourline-high" | "harbourline-middle-gases";
  name: string;
  description: string;
  source: string;
  vintage: string;
  startYear: number;
  agents: Partial<Record<ForcingAgent, { erf: number[] } | { ppm: number[] } | { ppb: number[] }>>;
}

const START = 1750;
const ANCHOR = 2019;
const END = 2100;
const YEARS = yearsBetween(START, END);

/** How each agent's ERF moves from its 2019 value to 2100 in one invented scenario (W m-2 in 2100). */
interface FutureTargets {
  co2: number;
  ch4: number;
  n2o: number;
  "other-wmghg": number;
  ozone: number;
  aerosol: number; // multiplier on both aerosol agents' 2019 values (and on particles on snow and ice)
  "land-use": number;
  contrails: number; // contrails and aviation-induced cirrus, W m-2 in 2100
}

type ShapedAgent = Exclude<keyof typeof AR6_ERF_2019, "other">;

/**
 * Historical shape per agent (invented curves, pinned to the AR6 2019 values): well-mixed
 * gases accelerate (CO2 slowest e-folding), aerosols and ozone rise mostly after 1900.
 */
function historical(agent: ShapedAgent, year: number): number {
  const target = AR6_ERF_2019[agent];
  switch (agent) {
    case "co2":
      return target * acceleratingRise(year, START, ANCHOR, 55);
    case "ch4":
    case "n2o":
      return target * acceleratingRise(year, START, ANCHOR, 65);
    case "other-wmghg":
      return target * logisticRise(year, 1930, ANCHOR, 1985, 12);
    case "ozone":
      return target * logisticRise(year, START, ANCHOR, 1965, 25);
    case "aerosol-radiation":
    case "aerosol-cloud":
      return target * logisticRise(year, START, ANCHOR, 1955, 18);
    case "land-use":
      return target * acceleratingRise(year, START, ANCHOR, 90);
    case "solar":
      // An 11-year cycle of ±0.05 W m-2 around a flat mean that reaches 0.01 in 2019 (invented phase).
      return round(0.05 * Math.sin((2 * Math.PI * (year - 2014)) / 11) + target * (year - START) / (ANCHOR - START), 4);
  }
}

/** From the 2019 value to the scenario's 2100 value along an ease-in-out curve (invented). */
function future(from: number, to: number, year: number, settleBy = END): number {
  return from + (to - from) * easeInOut(year, ANCHOR, settleBy);
}

/**
 * The `other` agent: AR6's three smaller categories, each on its own invented shape —
 * stratospheric water vapour from CH4 oxidation follows the CH4 forcing (in proportion, past
 * and future); light-absorbing particles on snow and ice follow the aerosol curve (black
 * carbon) and clear with it; contrails and aviation-induced cirrus grow with aviation from
 * 1940 (accelerating, e-folding 30 years) to the scenario's 2100 value.
 */
function otherSeries(targets: FutureTargets): number[] {
  const water = AR6_OTHER_PARTS_2019.stratosphericWaterVapour.central;
  const snow = AR6_OTHER_PARTS_2019.snowAndIceParticles.central;
  const contrails = AR6_OTHER_PARTS_2019.contrailsAndCirrus.central;
  return YEARS.map((y) => {
    if (y <= ANCHOR) {
      const aerosolShape = logisticRise(y, START, ANCHOR, 1955, 18);
      return round(water * acceleratingRise(y, START, ANCHOR, 65) + snow * aerosolShape + contrails * acceleratingRise(y, 1940, ANCHOR, 30));
    }
    const ch4Share = future(AR6_ERF_2019.ch4, targets.ch4, y) / AR6_ERF_2019.ch4;
    return round(water * ch4Share + future(snow, snow * targets.aerosol, y, 2070) + future(contrails, targets.contrails, y));
  });
}

function erfSeries(targets: FutureTargets): DemoPathway["agents"] {
  const series = (agent: ShapedAgent, to2100: number | null, settleBy = END) =>
    YEARS.map((y) => round(y <= ANCHOR || to2100 === null ? historical(agent, Math.min(y, ANCHOR)) : future(AR6_ERF_2019[agent], to2100, y, settleBy)));
  const solar = YEARS.map((y) => historical("solar", y));
  return {
    co2: { erf: series("co2", targets.co2) },
    ch4: { erf: series("ch4", targets.ch4) },
    n2o: { erf: series("n2o", targets.n2o) },
    "other-wmghg": { erf: series("other-wmghg", targets["other-wmghg"]) },
    ozone: { erf: series("ozone", targets.ozone) },
    "aerosol-radiation": { erf: series("aerosol-radiation", AR6_ERF_2019["aerosol-radiation"] * targets.aerosol, 2070) },
    "aerosol-cloud": { erf: series("aerosol-cloud", AR6_ERF_2019["aerosol-cloud"] * targets.aerosol, 2070) },
    "land-use": { erf: series("land-use", targets["land-use"]) },
    other: { erf: otherSeries(targets) },
    solar: { erf: solar },
  };
}

const LOW: FutureTargets = { co2: 2.55, ch4: 0.3, n2o: 0.24, "other-wmghg": 0.25, ozone: 0.3, aerosol: 0.35, "land-use": -0.18, contrails: 0.05 };
const MIDDLE: FutureTargets = { co2: 4.1, ch4: 0.62, n2o: 0.36, "other-wmghg": 0.35, ozone: 0.5, aerosol: 0.55, "land-use": -0.24, contrails: 0.1 };
const HIGH: FutureTargets = { co2: 6.6, ch4: 0.95, n2o: 0.48, "other-wmghg": 0.45, ozone: 0.75, aerosol: 0.75, "land-use": -0.28, contrails: 0.14 };

const VINTAGE = "Harbourline scenario set 2025.1 (illustrative)";
const ILLUSTRATIVE =
  "ILLUSTRATIVE demo data for the invented insurer Harbourline Mutual: not a published scenario and not a forecast.";

function erfPathway(key: DemoPathway["key"], name: string, story: string, targets: FutureTargets): DemoPathway {
  return {
    key,
    name,
    description: `${ILLUSTRATIVE} ${story} ERF per agent in W m-2, one value per year ${START}–${END}. ${OTHER_AGENT_NOTE}`,
    source: `Invented by Plumeline for the demo; ${AR6_SOURCE_NOTE}; 2020–${END} invented (${targets.co2} W m-2 CO2 ERF in ${END}).`,
    vintage: VINTAGE,
    startYear: START,
    agents: erfSeries(targets),
  };
}

/** CO2/CH4/N2O as concentrations (engine applies the AR6 expressions), other agents as the Middle ERFs. */
function concentrationPathway(): DemoPathway {
  const middle = erfSeries(MIDDLE);
  const gas = (key: "co2" | "ch4" | "n2o", tau: number, in2100: number) =>
    YEARS.map((y) => {
      const a = AR6_CONCENTRATIONS[1750][key];
      const b = AR6_CONCENTRATIONS[2019][key];
      if (y <= ANCHOR) return round(a + (b - a) * acceleratingRise(y, START, ANCHOR, tau), 2);
      return round(b + (in2100 - b) * easeInOut(y, ANCHOR, END), 2);
    });
  return {
    key: "harbourline-middle-gases",
    name: "Harbourline Middle (gas concentrations)",
    description:
      `${ILLUSTRATIVE} The Middle story with CO2 (ppm), CH4 and N2O (ppb) given as concentrations; ` +
      `the engine turns them into forcing with the chosen published expression. Other agents: ERF in W m-2. ${OTHER_AGENT_NOTE}`,
    source:
      `Invented by Plumeline for the demo; CO2, CH4, N2O in 1750 (278.3 ppm, 729.2 ppb, 270.1 ppb) and 2019 ` +
      `(409.9 ppm, 1866.3 ppb, 332.1 ppb) from IPCC AR6 WGI TS §TS.2.2; other agents as Harbourline Middle (ERFs of ` +
      `AR6 WGI Ch. 7 Table 7.8 in 2019); 2020–${END} invented (560 ppm CO2 in ${END}).`,
    vintage: VINTAGE,
    startYear: START,
    agents: {
      co2: { ppm: gas("co2", 55, 560) },
      ch4: { ppb: gas("ch4", 65, 1950) },
      n2o: { ppb: gas("n2o", 65, 385) },
      "other-wmghg": middle["other-wmghg"]!,
      ozone: middle.ozone!,
      "aerosol-radiation": middle["aerosol-radiation"]!,
      "aerosol-cloud": middle["aerosol-cloud"]!,
      "land-use": middle["land-use"]!,
      other: middle.other!,
      solar: middle.solar!,
    },
  };
}

/** The demo scenario set: three ERF pathways and one given by gas concentrations. */
export const demoPathways: readonly DemoPathway[] = [
  erfPathway("harbourline-low", "Harbourline Low", "A strong-mitigation story: CO2 forcing levels off by mid-century and aerosols clear.", LOW),
  erfPathway("harbourline-middle", "Harbourline Middle", "A middle-of-the-road story: forcing keeps rising, slower after 2060.", MIDDLE),
  erfPathway("harbourline-high", "Harbourline High", "A high-emissions story: CO2 forcing roughly triples its 2019 level by 2100.", HIGH),
  concentrationPathway(),
];
