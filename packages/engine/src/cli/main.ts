#!/usr/bin/env node
import { writeFileSync } from "node:fs";
import { runW1 } from "../bench/run-w1.js";
import { memberTableCsv } from "../ensemble/member-table-csv.js";
import { memberTable } from "../ensemble/member-table.js";
import { preparePlan } from "../ensemble/prepare-plan.js";
import { inputHash } from "../hash/run-hashes.js";
import { runEnsembleParallel } from "../node/run-ensemble-parallel.js";
import { SpecError } from "../spec/spec-error.js";
import { CliError } from "./cli-error.js";
import { parseArgs } from "./parse-args.js";
import { progressBar } from "./progress-bar.js";
import { readSpecFile, userPath } from "./read-spec-file.js";

/**
 * The engine's command line (its stable contract, described in packages/engine/README.md): stdout carries only the JSON
 * answer; problems go to stderr with a non-zero exit code (2 for bad input, 1 otherwise).
 */
async function main(argv: string[]): Promise<void> {
  const args = parseArgs(argv);
  if (args.command === "bench") {
    process.stdout.write(
      `${JSON.stringify(await runW1(args.members!, {
        ...(args.threads ? { threads: args.threads } : {}),
        scope: args.full ? "full" : "w1",
        debug: args.debug === true,
        ...(args.seed !== undefined ? { seed: args.seed } : {}),
        cold: args.cold === true,
      }))}\n`,
    );
    return;
  }
  const spec = readSpecFile(args.file!);
  if (args.command === "validate") {
    // Everything short of running: the schema, the engine's own checks and the sampling.
    const { spec: withDefaults } = preparePlan(spec);
    const answer = {
      valid: true,
      members: withDefaults.members,
      pathways: withDefaults.pathways.length,
      inputHash: inputHash(withDefaults),
    };
    process.stdout.write(`${JSON.stringify(answer)}\n`);
    return;
  }
  if (args.command === "members") {
    const csv = memberTableCsv(memberTable(spec));
    if (args.out) writeFileSync(userPath(args.out), csv);
    else process.stdout.write(csv);
    return;
  }
  const onProgress = progressBar();
  const result = await runEnsembleParallel(spec, {
    ...(args.threads ? { threads: args.threads } : {}),
    ...(onProgress ? { onProgress } : {}),
  });
  const text = `${JSON.stringify(result)}\n`;
  if (args.out) writeFileSync(userPath(args.out), text);
  else process.stdout.write(text);
}

main(process.argv.slice(2)).catch((error: unknown) => {
  if (error instanceof CliError || error instanceof SpecError) {
    process.stderr.write(`${error.message}\n`);
    process.exitCode = 2;
  } else {
    process.stderr.write(`${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
    process.exitCode = 1;
  }
});
