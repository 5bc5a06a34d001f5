import type { PerilProfile } from "@plumeline/contracts";
import { demoOrganisation } from "../organisation.js";

const [northmere, vellan] = demoOrganisation.regions;

/**
 * Warming already in the demo insurer's risk view: its catastrophe model is calibrated on
 * recent decades, taken as the observed 2011–2020 warming of 1.09 K over 1850–1900 (IPCC AR6
 * WGI SPM A.1.2), rounded to 1.1 K. Illustrative choice for the invented insurer.
 */
const RISK_VIEW_WARMING = 1.1;

/**
 * Heavy-rainfall rate: about 7 % per K (IPCC AR6 WGI SPM B.2.4; the Clausius–Clapeyron rate
 * of the Magnus form, Alduchov & Eskridge 1996, is 6–7.5 % per K over 0–25 °C). The 5–95 %
 * range of 5–9 % per K around it is illustrative, not an assessed range.
 */
const heavyRainfallRate = { type: "range", p50: 0.07, low: 0.05, high: 0.09, coverage: 90, shape: "split-normal" } as const;

/**
 * Demo peril profiles of the invented insurer (illustrative). Applying a rainfall-intensity
 * rate directly to flood loss severity is a common simplification, not a hazard model.
 */
export const demoPerilProfiles: PerilProfile[] = [
  {
    id: "demo-flood-northmere",
    name: `Heavy-rainfall flood, ${northmere}`,
    peril: "flood-heavy-rainfall",
    region: northmere,
    metric: "severity",
    baselineWarming: RISK_VIEW_WARMING,
    scaling: { kind: "per-kelvin", rate: heavyRainfallRate },
    source: "About 7 % per K: IPCC AR6 WGI SPM B.2.4 (extreme daily precipitation) and the Clausius–Clapeyron rate; common practice. Range 5–9 % per K illustrative.",
  },
  {
    id: "demo-flood-vellan",
    name: `Heavy-rainfall flood, ${vellan}`,
    peril: "flood-heavy-rainfall",
    region: vellan,
    metric: "severity",
    baselineWarming: RISK_VIEW_WARMING,
    scaling: { kind: "per-kelvin", rate: heavyRainfallRate },
    source: "About 7 % per K: IPCC AR6 WGI SPM B.2.4 (extreme daily precipitation) and the Clausius–Clapeyron rate; common practice. Range 5–9 % per K illustrative.",
  },
  {
    id: "demo-heat-vellan",
    name: `Hot-day frequency, ${vellan}`,
    peril: "heat",
    region: vellan,
    metric: "frequency",
    baselineWarming: RISK_VIEW_WARMING,
    scaling: {
      kind: "table",
      // How often the 1850–1900 hot extreme of each return period occurs at 1/1.5/2/4 °C of global
      // warming: AR6 WGI SPM Figure SPM.6 (CMIP6 medians over land), 10-year events in times per
      // 10 years, 50-year events in times per 50 years; 1 at 0 °C by definition.
      tables: [
        {
          returnPeriod: 10,
          points: [
            { warming: 0, multiplier: 1 },
            { warming: 1, multiplier: 2.8 },
            { warming: 1.5, multiplier: 4.1 },
            { warming: 2, multiplier: 5.6 },
            { warming: 4, multiplier: 9.4 },
          ],
        },
        {
          returnPeriod: 50,
          points: [
            { warming: 0, multiplier: 1 },
            { warming: 1, multiplier: 4.8 },
            { warming: 1.5, multiplier: 8.6 },
            { warming: 2, multiplier: 13.9 },
            { warming: 4, multiplier: 39.2 },
          ],
        },
      ],
      beyondTable: "hold",
      beyondReturnPeriods: "hold",
    },
    source:
      "IPCC AR6 WGI SPM Figure SPM.6: 10-year hot extremes 2.8/4.1/5.6/9.4 times per 10 years and 50-year hot extremes 4.8/8.6/13.9/39.2 times per 50 years at 1/1.5/2/4 °C (CMIP6 medians over land; values read in reproductions of the figure). Global land medians used for one region, held beyond 4 °C and beyond 50 years: illustrative.",
  },
  {
    id: "demo-wind-northmere",
    name: `Windstorm, ${northmere}`,
    peril: "wind",
    region: northmere,
    metric: "severity",
    baselineWarming: RISK_VIEW_WARMING,
    // Illustrative: a modest, uncertain per-kelvin change in windstorm loss, centred at +1.5 %/K.
    scaling: { kind: "per-kelvin", rate: { type: "triangular", min: -0.01, mode: 0.015, max: 0.04 } },
    source: "Illustrative only: no assessed per-degree rate for this peril and region.",
  },
];
