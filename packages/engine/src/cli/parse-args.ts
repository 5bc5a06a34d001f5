import { CliError } from "./cli-error.js";

export const USAGE = `usage:
  engine run SPEC.json [--out FILE] [--threads T]   result JSON on stdout (or FILE)
  engine members SPEC.json [--out FILE]            CSV, one row per member: member, inputs,
                                                   weight, <pathwayId>@<year> warming (K)
  engine validate SPEC.json                        checks a spec without running it
  engine bench --members N [--threads T] [--full] [--cold] [--debug] [--seed S]
                                                   one W1 benchmark line (bench-reference/README.md);
                                                   --full also summarises forcing and imbalance;
                                                   --cold times a fresh process's first run (default: a
                                                   run after one untimed W1 run, as in a server);
                                                   --debug adds the process CPU seconds (cpu_s);
                                                   --seed draws another ensemble (default "w1")`;

export interface ParsedArgs {
  command: "run" | "members" | "validate" | "bench";
  file?: string;
  out?: string;
  members?: number;
  threads?: number;
  /** bench: also summarise forcing and imbalance per year (the product's full summaries). */
  full?: boolean;
  /** bench: time a fresh process's first run (default: a run after one untimed W1 run, as a long-lived server's). */
  cold?: boolean;
  /** bench: add diagnostic fields to the line (cpu_s: CPU seconds of all threads during the run). */
  debug?: boolean;
  /** bench: the run's seed (default "w1"), to see how the check value varies between ensembles. */
  seed?: string;
}

/** Parses the CLI's small grammar; anything unexpected is a CliError naming the argument. */
export function parseArgs(argv: string[]): ParsedArgs {
  const [command, ...rest] = argv;
  if (command !== "run" && command !== "members" && command !== "validate" && command !== "bench")
    throw new CliError(command ? `unknown command "${command}"\n${USAGE}` : USAGE);
  const parsed: ParsedArgs = { command };
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i]!;
    const value = () => {
      const v = rest[++i];
      if (v === undefined) throw new CliError(`${arg} needs a value`);
      return v;
    };
    const count = (name: string) => {
      const v = Number(value());
      if (!Number.isInteger(v) || v < 1) throw new CliError(`${name} must be a whole number ≥ 1`);
      return v;
    };
    if (arg === "--out" && (command === "run" || command === "members")) parsed.out = value();
    else if (arg === "--threads" && (command === "run" || command === "bench")) parsed.threads = count("--threads");
    else if (arg === "--members" && command === "bench") parsed.members = count("--members");
    else if (arg === "--full" && command === "bench") parsed.full = true;
    else if (arg === "--debug" && command === "bench") parsed.debug = true;
    else if (arg === "--cold" && command === "bench") parsed.cold = true;
    else if (arg === "--seed" && command === "bench") {
      parsed.seed = value();
      if (parsed.seed === "") throw new CliError("--seed must not be empty");
    } else if (!arg.startsWith("--") && command !== "bench" && parsed.file === undefined) parsed.file = arg;
    else throw new CliError(`unexpected argument "${arg}"\n${USAGE}`);
  }
  if (command !== "bench" && parsed.file === undefined) throw new CliError(`${command} needs a SPEC.json file\n${USAGE}`);
  if (command === "bench" && parsed.members === undefined) parsed.members = 100_000;
  return parsed;
}
