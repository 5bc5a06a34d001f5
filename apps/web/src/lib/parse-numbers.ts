/**
 * Reads a comma- or space-separated list of numbers as typed in a form ("2030, 2050 2100").
 * Returns the numbers, or the first token that is not a number so the form can name it.
 */
export function parseNumbers(text: string): { values: number[] } | { bad: string } {
  const tokens = text.split(/[\s,;]+/).filter(Boolean);
  const values: number[] = [];
  for (const t of tokens) {
    const v = Number(t);
    if (!Number.isFinite(v)) return { bad: t };
    values.push(v);
  }
  return { values };
}
