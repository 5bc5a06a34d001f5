/**
 * Reads chart geometry back out of rendered SVG, independently of the chart's own scales:
 * the linear map value -> pixel is rebuilt from two rendered axis ticks (their labels and
 * positions), so a test can check that a band's edge sits where the axis says p95 is.
 */
export function tickMap(container: Element, axis: "x" | "y"): (v: number) => number {
  const ticks = [...container.querySelectorAll(`.axis-${axis} [data-tick]`)].map((g) => {
    const m = /translate\(([-\d.e]+),([-\d.e]+)\)/.exec(g.getAttribute("transform") ?? "");
    if (!m) throw new Error("tick without translate");
    return { value: Number(g.getAttribute("data-tick")), px: Number(axis === "x" ? m[1] : m[2]) };
  });
  if (ticks.length < 2) throw new Error(`need two ${axis} ticks, found ${ticks.length}`);
  const a = ticks[0]!;
  const b = ticks[ticks.length - 1]!;
  const slope = (b.px - a.px) / (b.value - a.value);
  return (v: number) => a.px + (v - a.value) * slope;
}

/** Points of a path drawn with straight segments (M/L commands, as d3's linear curve writes them). */
export function pathPoints(d: string): Array<[number, number]> {
  const nums = d.match(/-?\d*\.?\d+(?:e[-+]?\d+)?/gi)?.map(Number) ?? [];
  const pts: Array<[number, number]> = [];
  for (let i = 0; i + 1 < nums.length; i += 2) pts.push([nums[i]!, nums[i + 1]!]);
  return pts;
}
