import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { LIGHT_COLORS, THRESHOLD_LINES } from "./palette.js";

// The web app states the light theme as CSS variables (beside the dark theme it switches to);
// the printed report reads LIGHT_COLORS directly. This holds the two to the same colours.
const stylesheet = readFileSync(new URL("../../../../apps/web/src/styles/index.css", import.meta.url), "utf8");

/** The `--pl-*` variables of the stylesheet's first (light-theme) `:root` block. */
function lightThemeVariables(css: string): Record<string, string> {
  const block = /:root\s*\{([^}]*)\}/.exec(css)?.[1] ?? "";
  return Object.fromEntries([...block.matchAll(/--pl-([\w-]+):\s*([^;]+);/g)].map((m) => [m[1]!, m[2]!.trim()]));
}

describe("shared palette", () => {
  it("holds the same light-theme colours as the web stylesheet's variables", () => {
    const css = lightThemeVariables(stylesheet);
    expect(Object.keys(css).length).toBeGreaterThan(20);
    for (const [name, hex] of Object.entries(LIGHT_COLORS)) expect({ name, value: css[name] }).toEqual({ name, value: hex });
  });

  it("gives every threshold line a colour the web theme also defines, and a dash of its own", () => {
    const css = lightThemeVariables(stylesheet);
    for (const line of THRESHOLD_LINES) expect(css[line.color]).toBeDefined();
    expect(new Set(THRESHOLD_LINES.map((l) => l.dash.join(" "))).size).toBe(THRESHOLD_LINES.length);
  });
});
