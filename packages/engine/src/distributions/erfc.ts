/* Coefficients of W. J. Cody's rational Chebyshev approximations (Cody 1969, as used in his
   CALERF routine), good to about 1e-16 relative in IEEE double precision. */
const ERF_NEAR_ZERO_NUM = [3.1611237438705656, 113.86415415105016, 377.485237685302021, 3209.37758913846947, 0.185777706184603153];
const ERF_NEAR_ZERO_DEN = [23.6012909523441209, 244.024637934444173, 1282.61652607737228, 2844.23683343917062];
const ERFC_MIDDLE_NUM = [
  0.564188496988670089, 8.88314979438837594, 66.1191906371416295, 298.635138197400131, 881.95222124176909,
  1712.04761263407058, 2051.07837782607147, 1230.33935479799725, 2.15311535474403846e-8,
];
const ERFC_MIDDLE_DEN = [
  15.7449261107098347, 117.693950891312499, 537.181101862009858, 1621.38957456669019, 3290.79923573345963,
  4362.61909014324716, 3439.36767414372164, 1230.33935480374942,
];
const ERFC_TAIL_NUM = [0.305326634961232344, 0.360344899949804439, 0.125781726111229246, 0.0160837851487422766, 6.58749161529837803e-4, 0.0163153871373020978];
const ERFC_TAIL_DEN = [2.56852019228982242, 1.87295284992346047, 0.527905102951428412, 0.0605183413124413191, 0.00233520497626869185];
const ONE_OVER_SQRT_PI = 0.5641895835477563;
/** erfc(x) underflows to 0 in double precision beyond this argument (Cody's XBIG). */
const ERFC_UNDERFLOW = 26.543;

/**
 * Complementary error function erfc(x) = 1 − erf(x).
 *
 * Method: W. J. Cody's three rational Chebyshev approximations (|x| ≤ 0.46875, ≤ 4, > 4),
 * with exp(−x²) split as exp(−h²)·exp(−(x−h)(x+h)), h = x rounded down to 1/16, so the
 * Gaussian factor keeps full relative precision far into the tail; negative x by reflection.
 * Accuracy about 1e-16 relative for x ≥ 0. Cost: O(1), two exp calls at most.
 * Reference: W. J. Cody (1969), "Rational Chebyshev approximations for the error function",
 * Math. Comp. 23(107), 631–637.
 *
 * Example: `erfc(1)` → 0.15729920705028516 (exact 0.157299207050285130…).
 */
export function erfc(x: number): number {
  const y = Math.abs(x);
  let result: number;
  if (y <= 0.46875) {
    const ysq = y > 1.11e-16 ? y * y : 0;
    let num = ERF_NEAR_ZERO_NUM[4]! * ysq;
    let den = ysq;
    for (let i = 0; i < 3; i++) {
      num = (num + ERF_NEAR_ZERO_NUM[i]!) * ysq;
      den = (den + ERF_NEAR_ZERO_DEN[i]!) * ysq;
    }
    return 1 - (x * (num + ERF_NEAR_ZERO_NUM[3]!)) / (den + ERF_NEAR_ZERO_DEN[3]!);
  }
  if (y <= 4) {
    let num = ERFC_MIDDLE_NUM[8]! * y;
    let den = y;
    for (let i = 0; i < 7; i++) {
      num = (num + ERFC_MIDDLE_NUM[i]!) * y;
      den = (den + ERFC_MIDDLE_DEN[i]!) * y;
    }
    result = (num + ERFC_MIDDLE_NUM[7]!) / (den + ERFC_MIDDLE_DEN[7]!);
  } else if (y < ERFC_UNDERFLOW) {
    const inverseSquare = 1 / (y * y);
    let num = ERFC_TAIL_NUM[5]! * inverseSquare;
    let den = inverseSquare;
    for (let i = 0; i < 4; i++) {
      num = (num + ERFC_TAIL_NUM[i]!) * inverseSquare;
      den = (den + ERFC_TAIL_DEN[i]!) * inverseSquare;
    }
    result = (inverseSquare * (num + ERFC_TAIL_NUM[4]!)) / (den + ERFC_TAIL_DEN[4]!);
    result = (ONE_OVER_SQRT_PI - result) / y;
  } else {
    result = 0;
  }
  if (result !== 0) {
    const rounded = Math.trunc(y * 16) / 16;
    const remainder = (y - rounded) * (y + rounded);
    result = Math.exp(-rounded * rounded) * Math.exp(-remainder) * result;
  }
  return x < 0 ? 2 - result : result;
}
