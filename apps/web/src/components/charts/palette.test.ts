// @vitest-environment node
import { describe, expect, it } from "vitest";
import { agentColor, seriesColor, thresholdStyle } from "./palette";

describe("chart palette", () => {
  it("draws series and thresholds through the theme's variables, and repeats or holds past the end", () => {
    expect(seriesColor(0)).toBe("var(--pl-series-1)");
    expect(seriesColor(5)).toBe(seriesColor(0));
    expect(thresholdStyle(0)).toEqual({ color: "var(--pl-threshold-1)", dash: "2 2" });
    expect(thresholdStyle(3)).toEqual({ color: "var(--pl-threshold-4)", dash: "1 3" });
    expect(thresholdStyle(9)).toEqual(thresholdStyle(3));
    expect(agentColor("not-an-agent")).toBe(agentColor("other"));
  });
});
