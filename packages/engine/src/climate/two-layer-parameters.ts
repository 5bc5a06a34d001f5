/**
 * Parameters of the two-layer energy balance model with deep-ocean efficacy
 * (Held et al. 2010; Geoffroy et al. 2013a,b):
 *   C  dT/dt  = F − λT − εγ(T − T0)
 *   C0 dT0/dt = γ(T − T0)
 * Units: λ, γ in W m⁻² K⁻¹; C, C0 in W yr m⁻² K⁻¹; ε dimensionless; time in years.
 */
export interface TwoLayerParameters {
  /** Feedback parameter λ = F2x/ECS (W m⁻² K⁻¹). */
  lambda: number;
  /** Heat capacity C of the upper layer: atmosphere, land and ocean mixed layer (W yr m⁻² K⁻¹). */
  upperHeatCapacity: number;
  /** Heat capacity C0 of the deep ocean (W yr m⁻² K⁻¹). */
  deepHeatCapacity: number;
  /** Heat-exchange coefficient γ between the layers (W m⁻² K⁻¹). */
  heatExchange: number;
  /** Efficacy ε of deep-ocean heat uptake (1 = Part I model; Part II mean ≈ 1.28, from memory of Geoffroy et al. 2013b). */
  deepEfficacy: number;
}

const NAMES: ReadonlyArray<keyof TwoLayerParameters> = ["lambda", "upperHeatCapacity", "deepHeatCapacity", "heatExchange", "deepEfficacy"];

/**
 * Checks every parameter is a finite number > 0, naming the first that is not.
 *
 * Example: `validateTwoLayerParameters({ ...p, heatExchange: 0 })` throws
 * RangeError("heatExchange must be > 0").
 */
export function validateTwoLayerParameters(p: TwoLayerParameters): void {
  if (p === null || typeof p !== "object") throw new RangeError("parameters must be an object");
  for (const name of NAMES) {
    const value = p[name];
    if (typeof value !== "number" || !Number.isFinite(value)) throw new RangeError(`${name} must be a finite number`);
    if (!(value > 0)) throw new RangeError(`${name} must be > 0`);
  }
}
