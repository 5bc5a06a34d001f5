#!/usr/bin/env node
// Launcher of the engine CLI. Runs the compiled CLI in dist/, first compiling the engine
// (and the contracts package it validates specs with) when dist is missing or older than
// any source file, so a fresh clone works. Compiler output goes to stderr: stdout carries
// only the CLI's JSON.
import { spawnSync } from "node:child_process";
import { existsSync, readdirSync, statSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const engineDir = join(dirname(fileURLToPath(import.meta.url)), "..");
const contractsDir = join(engineDir, "..", "contracts");

function newestSource(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestSource(path));
    else if (entry.name.endsWith(".ts") && !entry.name.endsWith(".test.ts")) newest = Math.max(newest, statSync(path).mtimeMs);
  }
  return newest;
}

function buildIfStale(packageDir, entry) {
  const output = join(packageDir, "dist", entry);
  const inputs = Math.max(newestSource(join(packageDir, "src")), statSync(join(packageDir, "tsconfig.build.json")).mtimeMs);
  if (existsSync(output) && statSync(output).mtimeMs >= inputs) return;
  const tsc = createRequire(join(packageDir, "package.json")).resolve("typescript/bin/tsc");
  const run = spawnSync(process.execPath, [tsc, "-p", "tsconfig.build.json"], { cwd: packageDir, stdio: ["ignore", 2, 2] });
  if (run.status !== 0) {
    process.stderr.write(`building ${packageDir} failed\n`);
    process.exit(1);
  }
}

buildIfStale(contractsDir, "index.js");
buildIfStale(engineDir, join("cli", "main.js"));
await import(pathToFileURL(join(engineDir, "dist", "cli", "main.js")).href);
