import { createRequire } from "node:module";
import path from "node:path";
import { pathToFileURL } from "node:url";

/**
 * How to start a worker thread's code, given the URL of a module beside it without its
 * extension (new URL("./engine-thread", import.meta.url)). From a compiled build (.js) it is a
 * plain worker file. From TypeScript sources (`node --import tsx`, vitest) Node 20 does not
 * pass module loaders on to worker threads, so a two-line bootstrap registers tsx's ESM hooks
 * inside the thread (tsx's public `tsx/esm/api`) and then imports the .ts file.
 */
export function threadEntry(callerUrl: string, baseName: string): { entry: URL | string; eval: boolean } {
  if (!callerUrl.endsWith(".ts")) return { entry: new URL(`./${baseName}.js`, callerUrl), eval: false };
  const require = createRequire(callerUrl);
  const tsxPackage = require.resolve("tsx/package.json");
  const exportsMap = (require("tsx/package.json") as { exports: Record<string, { import?: { default?: string } }> }).exports;
  const esmApi = pathToFileURL(path.join(path.dirname(tsxPackage), exportsMap["./esm/api"]?.import?.default ?? "dist/esm/api/index.mjs")).href;
  const target = new URL(`./${baseName}.ts`, callerUrl).href;
  // A bootstrap that fails has no logger yet (it could not load one); its stderr reaches the parent.
  const code =
    `import(${JSON.stringify(esmApi)}).then((tsx) => { tsx.register(); return import(${JSON.stringify(target)}); })` +
    `.catch((error) => { console.error("[${baseName}] could not start:", error); process.exit(1); });`;
  return { entry: code, eval: true };
}
