/**
 * Published anchor values the demo pathways are shaped from, with how sure each is.
 *
 * ERF 2019 vs 1750 by agent, W m-2: IPCC AR6 WGI Chapter 7 (Forster et al. 2021), Table 7.8;
 * central values for CO2, CH4, N2O, halogenated gases, ozone, total aerosol and land use also
 * in the AR6 Technical Summary Section TS.2.2; the aerosol–radiation / aerosol–cloud split and
 * solar read in secondary copies of Table 7.8. Concentrations 1750 and 2019: AR6 TS Section
 * TS.2.2 (2019 values and increases; 1750 by subtraction, computed; CH4 729.2 ppb from memory).
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
  solar: 0.01,
} as const;

export const AR6_CONCENTRATIONS = {
  1750: { co2: 278.3, ch4: 729.2, n2o: 270.1 },
  2019: { co2: 409.9, ch4: 1866.3, n2o: 332.1 },
} as const;

export const AR6_SOURCE_NOTE =
  "1750–2019 shaped to reach the IPCC AR6 WGI Ch. 7 (Forster et al. 2021) Table 7.8 ERFs for 2019 vs 1750 " +
  "(CO2 2.16, CH4 0.54, N2O 0.21, halogenated 0.41, ozone 0.47, aerosol–radiation −0.22, aerosol–cloud −0.84, " +
  "land use −0.20, solar 0.01 W m-2)";
