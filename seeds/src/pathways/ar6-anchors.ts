/**
 * Published anchor values the demo pathways are shaped from.
 *
 * ERF 2019 vs 1750 by agent, W m-2: IPCC AR6 WGI Chapter 7 (Forster et al. 2021), Table 7.8.
 * Central values for CO2, CH4, N2O, halogenated gases, ozone, total aerosol and land use are
 * also printed in the AR6 Technical Summary §TS.2.2; the aerosol–radiation / aerosol–cloud
 * split and solar were read in secondary copies of Table 7.8. The three smaller categories
 * gathered in the `other` agent (stratospheric water vapour from CH4 0.05, light-absorbing
 * particles on snow and ice 0.08, contrails and aviation-induced cirrus 0.06) are Table 7.8
 * rows quoted from memory. With them the anthropogenic agents add up to AR6's total
 * anthropogenic ERF of 2.72 W m-2 (AR6 WGI SPM A.4.1).
 * Concentrations 1750 and 2019: AR6 TS Section TS.2.2 (2019 values and increases as printed, 1750
 * by subtraction; CH4 729.2 ppb from memory).
 */
export const AR6_ERF_2019 = {
  co2: 2.16,
  ch4: 0.54,
  n2o: 0.21,
  "other-wmghg": 0.41,
  ozone: 0.47,
  "aerosol-radiation": -0.22,
  "aerosol-cloud": -0.84,
  "land-use": -0.2,
  other: 0.19,
  solar: 0.01,
} as const;

/**
 * The `other` agent's three parts, ERF 2019 vs 1750 in W m-2 with AR6's 5–95 % ranges
 * (AR6 WGI Ch. 7 Table 7.8, from memory): they sum to AR6_ERF_2019.other.
 */
export const AR6_OTHER_PARTS_2019 = {
  stratosphericWaterVapour: { central: 0.05, low: 0.0, high: 0.1 },
  snowAndIceParticles: { central: 0.08, low: 0.0, high: 0.18 },
  contrailsAndCirrus: { central: 0.06, low: 0.02, high: 0.1 },
} as const;

/** AR6 WGI SPM A.4.1: total anthropogenic ERF 1750–2019, W m-2, central and 5–95 % range. */
export const AR6_TOTAL_ANTHROPOGENIC_2019 = { central: 2.72, low: 1.96, high: 3.48 } as const;

export const AR6_CONCENTRATIONS = {
  1750: { co2: 278.3, ch4: 729.2, n2o: 270.1 },
  2019: { co2: 409.9, ch4: 1866.3, n2o: 332.1 },
} as const;

export const AR6_SOURCE_NOTE =
  "1750–2019 shaped to reach the 2019 ERFs of IPCC AR6 WGI Ch. 7 Table 7.8 (Forster et al. 2021): CO2 2.16, CH4 0.54, " +
  "N2O 0.21, halogenated 0.41, ozone 0.47, aerosol–radiation −0.22, aerosol–cloud −0.84, land use −0.20, other 0.19, " +
  "solar 0.01 W m-2 (anthropogenic total 2.72, SPM A.4.1)";

/** What the `other` agent holds, for the pathway descriptions. */
export const OTHER_AGENT_NOTE =
  "Other = stratospheric water vapour from CH4 (0.05) + light-absorbing particles on snow and ice (0.08) + contrails and " +
  "aviation-induced cirrus (0.06 W m-2) in 2019, AR6 WGI Table 7.8 values from memory.";
