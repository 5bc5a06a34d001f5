import type { FanSeries } from "@/components/charts/fan-chart";

/**
 * Hand-made percentile series: every value is a simple function of the year so tests can
 * state the expected numbers directly (not a model output).
 */
export function fanFixture(id = "p1", name = "Middle road", offset = 0): FanSeries {
  const years = Array.from({ length: 11 }, (_, i) => 2000 + i * 10);
  const mid = years.map((_, i) => 1 + 0.2 * i + offset);
  return {
    id,
    name,
    years,
    p5: mid.map((v) => v - 0.6),
    p17: mid.map((v) => v - 0.3),
    p50: mid,
    p83: mid.map((v) => v + 0.35),
    p95: mid.map((v) => v + 0.8),
  };
}
