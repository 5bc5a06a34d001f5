/** Shared argument checks of the samplers (RangeError naming the parameter). */
export function requireCount(value: number, name: string, minimum: number): void {
  if (!Number.isInteger(value) || value < minimum) throw new RangeError(`${name} must be an integer ≥ ${minimum}`);
}
