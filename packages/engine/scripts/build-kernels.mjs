// Compiles src/kernels/member-kernels.wat (WebAssembly text) with wabt into
// src/kernels/member-kernels-wasm.ts, the module's bytes as base64, so the engine library
// needs no file reading or build step of its own to load them. Run after editing the .wat:
//   pnpm --filter @plumeline/engine build:kernels
// member-kernels.test.ts fails while the committed bytes differ from the .wat's.
// With --check, only reports whether they differ (exit code 1 when they do).
import { readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { kernelModuleSource, compileKernelText } from "./kernel-text.mjs";

const watPath = fileURLToPath(new URL("../src/kernels/member-kernels.wat", import.meta.url));
const outPath = fileURLToPath(new URL("../src/kernels/member-kernels-wasm.ts", import.meta.url));
const source = kernelModuleSource(await compileKernelText(readFileSync(watPath, "utf8")));
const current = (() => {
  try {
    return readFileSync(outPath, "utf8");
  } catch {
    return "";
  }
})();
if (process.argv.includes("--check")) {
  console.log(current === source ? "member-kernels-wasm.ts is up to date" : "member-kernels-wasm.ts differs from member-kernels.wat");
  process.exit(current === source ? 0 : 1);
}
if (current !== source) writeFileSync(outPath, source);
console.log(`${outPath}: ${current === source ? "unchanged" : "written"}`);
