/** Concentrations must be finite and > 0 (the expressions take logs and square roots). */
export function requireConcentration(value: number, name: string): void {
  if (typeof value !== "number" || !Number.isFinite(value)) throw new RangeError(`${name} must be a finite number`);
  if (!(value > 0)) throw new RangeError(`${name} must be > 0`);
}
