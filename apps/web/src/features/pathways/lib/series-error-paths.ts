/**
 * A server error about one value of a series names it by index ("agents.co2.ppm[12]"); a
 * reader thinks in years, so the index becomes the year it stands for ("agents.co2.ppm, year
 * 1862"). Other paths are returned as they are.
 */
export function nameSeriesYear(path: string, startYear: number): string {
  const m = /^(agents\.[a-z0-9-]+\.(?:erf|ppm|ppb))(?:\[(\d+)\]|\.(\d+))$/.exec(path);
  if (!m) return path;
  const index = Number(m[2] ?? m[3]);
  return `${m[1]}, year ${startYear + index}`;
}
