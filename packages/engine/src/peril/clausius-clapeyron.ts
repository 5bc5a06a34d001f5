/**
 * Saturation vapour pressure over water and its Clausius–Clapeyron rate, from the Magnus
 * form e_s(T) = A · exp(b·T / (T + c)), T in °C, e_s in hPa. The rate
 * d ln e_s / dT = b·c / (T + c)² is the documented source of the common "about 7 % per K"
 * default for heavy-rainfall scaling (Bolton 1980; AR6 WGI TS Box TS.6 and SPM B.2.4).
 *
 * Coefficients:
 * * Alduchov & Eskridge (1996), J. Appl. Meteor. 35(4), 601–609: A = 6.1094 hPa,
 *   b = 17.625, c = 243.04 °C (the default here).
 * * Bolton (1980), Mon. Wea. Rev. 108, 1046–1053: A = 6.112 hPa, b = 17.67, c = 243.5 °C.
 * Cost O(1).
 *
 * Example: clausiusClapeyronRate(15) → 0.0643 (6.43 % per K, AE96).
 */
export const MAGNUS_FORMS = {
  "alduchov-eskridge-1996": { prefactorHpa: 6.1094, b: 17.625, c: 243.04 },
  "bolton-1980": { prefactorHpa: 6.112, b: 17.67, c: 243.5 },
} as const;

export type MagnusForm = keyof typeof MAGNUS_FORMS;

/** The Magnus fits are made for about −40 to +50 °C over water; outside that they are not used. */
const VALID_RANGE_C = [-40, 50] as const;

function coefficients(tempC: number, form: MagnusForm) {
  if (typeof tempC !== "number" || !Number.isFinite(tempC)) throw new RangeError("tempC must be a finite number");
  if (tempC < VALID_RANGE_C[0] || tempC > VALID_RANGE_C[1])
    throw new RangeError(`tempC must lie between ${VALID_RANGE_C[0]} and ${VALID_RANGE_C[1]} °C (range of the Magnus fit)`);
  const k = MAGNUS_FORMS[form];
  if (!k) throw new RangeError(`form must be one of ${Object.keys(MAGNUS_FORMS).join(", ")}`);
  return k;
}

/** Saturation vapour pressure over water, hPa. Example: (0) → 6.1094; (0, "bolton-1980") → 6.112. */
export function saturationVapourPressure(tempC: number, form: MagnusForm = "alduchov-eskridge-1996"): number {
  const { prefactorHpa, b, c } = coefficients(tempC, form);
  return prefactorHpa * Math.exp((b * tempC) / (tempC + c));
}

/**
 * Fractional increase of saturation vapour pressure per K at tempC: d ln e_s / dT, as a
 * fraction (0.0725 = 7.25 % per K). Example: (0) → 17.625 / 243.04 = 0.07252.
 */
export function clausiusClapeyronRate(tempC: number, form: MagnusForm = "alduchov-eskridge-1996"): number {
  const { b, c } = coefficients(tempC, form);
  return (b * c) / ((tempC + c) * (tempC + c));
}
