export { monteCarloColumnInto, monteCarloUniforms } from "./monte-carlo.js";
export { latinHypercube, latinHypercubeColumnInto } from "./latin-hypercube.js";
export { imanConover } from "./iman-conover.js";
export { choleskyFactor } from "./cholesky.js";
export { shuffleInPlace } from "./shuffle.js";
