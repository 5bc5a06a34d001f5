export type { TwoLayerParameters } from "./two-layer-parameters.js";
export { validateTwoLayerParameters } from "./two-layer-parameters.js";
export { twoLayerPropagator, type TwoLayerPropagator } from "./two-layer-propagator.js";
export { twoLayerModes, stepResponse, rampResponse, type TwoLayerModes } from "./two-layer-modes.js";
