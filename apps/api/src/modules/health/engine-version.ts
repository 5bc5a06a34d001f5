import { readFile } from "node:fs/promises";
import path from "node:path";
import { repoRoot } from "../../config.js";

let cached: string | undefined;

/**
 * The engine's version as results record it: the engine package's exported
 * `ENGINE_VERSION` (or `engineVersion`) when it provides one, else its package.json version.
 */
export async function engineVersion(): Promise<string> {
  if (cached) return cached;
  try {
    // A variable specifier: the type checker must not require the engine build to exist.
    const specifier = "@plumeline/engine";
    const engine = (await import(specifier)) as Record<string, unknown>;
    const exported = engine.ENGINE_VERSION ?? engine.engineVersion;
    if (typeof exported === "string") return (cached = exported);
  } catch {
    // The engine build is absent (e.g. before `pnpm build`); fall back to its manifest.
  }
  const manifest = JSON.parse(await readFile(path.join(repoRoot, "packages/engine/package.json"), "utf8")) as { version: string };
  return (cached = manifest.version);
}
