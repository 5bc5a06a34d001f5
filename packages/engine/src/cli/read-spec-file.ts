import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { formatIssues, runSpecSchema } from "@plumeline/contracts";
import type { RunSpec } from "../spec/types.js";
import { CliError } from "./cli-error.js";

/** Paths on the command line are relative to where the user ran pnpm (INIT_CWD), not the package. */
export function userPath(path: string): string {
  return resolve(process.env.INIT_CWD ?? process.cwd(), path);
}

/**
 * Reads a run spec file and checks it against the shared contracts schema first (defaults
 * applied there); every problem becomes one line naming its field.
 */
export function readSpecFile(path: string): RunSpec {
  let text: string;
  try {
    text = readFileSync(userPath(path), "utf8");
  } catch (error) {
    throw new CliError(`cannot read ${path}: ${(error as NodeJS.ErrnoException).code ?? String(error)}`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    throw new CliError(`${path} is not valid JSON: ${(error as Error).message}`);
  }
  const parsed = runSpecSchema.safeParse(json);
  if (!parsed.success) throw new CliError(formatIssues(parsed.error).join("\n"));
  return parsed.data;
}
