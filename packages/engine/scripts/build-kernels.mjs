// Compiles each WebAssembly text module of src/kernels (kernel-text.mjs KERNEL_MODULES) with
// wabt into its generated TypeScript module, the bytes as base64, so the engine library needs
// no file reading or build step of its own to load them. Run after editing a .wat:
//   pnpm --filter @plumeline/engine build:kernels
// The kernels' tests fail while the committed bytes differ from the .wat's.
// With --check, only reports whether they differ (exit code 1 when any does).
import { readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { KERNEL_MODULES, compileKernelText, kernelModuleSource } from "./kernel-text.mjs";

let stale = false;
for (const kernel of KERNEL_MODULES) {
  const watPath = fileURLToPath(new URL(`../src/kernels/${kernel.wat}`, import.meta.url));
  const outPath = fileURLToPath(new URL(`../src/kernels/${kernel.ts}`, import.meta.url));
  const source = kernelModuleSource(await compileKernelText(readFileSync(watPath, "utf8"), kernel.wat), kernel);
  const current = (() => {
    try {
      return readFileSync(outPath, "utf8");
    } catch {
      return "";
    }
  })();
  if (process.argv.includes("--check")) {
    console.log(`${kernel.ts} ${current === source ? "is up to date" : `differs from ${kernel.wat}`}`);
    stale ||= current !== source;
    continue;
  }
  if (current !== source) writeFileSync(outPath, source);
  console.log(`${outPath}: ${current === source ? "unchanged" : "written"}`);
}
if (stale) process.exit(1);
