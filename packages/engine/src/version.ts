/**
 * Version of the engine's numerics. Part of every result: the same spec, seed and engine
 * version give the same resultHash. Raise it whenever a change can move any number.
 */
export const engineVersion = "0.3.0";
