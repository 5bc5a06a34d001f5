/**
 * Pre-industrial (1750) reference concentrations used by Plumeline's forcing series: CO2 in
 * ppm, CH4 and N2O in ppb.
 *
 * Source: IPCC AR6 WGI, 2019 values minus their increases since 1750 (TS Section TS.2.2):
 * CO2 409.9 − 131.6 = 278.3 ppm; N2O 332.1 − 62.0 = 270.1 ppb; CH4 1866.3 − 1137 = 729.3,
 * of which AR6's own tables use 729.2 (from memory) — we use 729.2.
 */
export const AR6_1750_CONCENTRATIONS = { co2: 278.3, ch4: 729.2, n2o: 270.1 } as const;
