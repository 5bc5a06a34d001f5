/**
 * Value range for a projected-loss axis: the lowest and highest of the values given (every
 * horizon's 5 % and 95 % ends, and today's AAL so its reference line is always drawn),
 * padded by 15 % of their span on each side. An axis from zero would squeeze an 18–22 m band
 * into a flat slab; zero is kept only when the data come near it anyway (the padded low end
 * is under a quarter of the high end, or below zero).
 * Example: lossAxisDomain([18e6, 22e6, 20e6]) gives { domain: [17.4e6, 22.6e6], fromZero: false }.
 */
export function lossAxisDomain(values: number[]): { domain: [number, number]; fromZero: boolean } {
  const finite = values.filter(Number.isFinite);
  if (finite.length === 0) return { domain: [0, 1], fromZero: true };
  const lo = Math.min(...finite);
  const hi = Math.max(...finite);
  const pad = hi > lo ? (hi - lo) * 0.15 : Math.abs(hi) * 0.05 || 1;
  const low = lo - pad;
  const high = hi + pad;
  if (low <= 0 || low < high * 0.25) return { domain: [Math.min(0, lo), high], fromZero: true };
  return { domain: [low, high], fromZero: false };
}
