import { describe, expect, it } from "vitest";
import { parseArgs } from "./parse-args.js";

describe("parseArgs: bench --seed", () => {
  it("takes a seed for bench, so the check value can be seen across ensembles", () => {
    expect(parseArgs(["bench", "--members", "2000", "--seed", "w1-3"])).toEqual({ command: "bench", members: 2000, seed: "w1-3" });
    expect(parseArgs(["bench"]).seed).toBeUndefined();
  });

  it("refuses an empty or missing seed, and a seed for other commands, naming the argument", () => {
    expect(() => parseArgs(["bench", "--seed", ""])).toThrow(/--seed must not be empty/);
    expect(() => parseArgs(["bench", "--seed"])).toThrow(/--seed needs a value/);
    expect(() => parseArgs(["run", "spec.json", "--seed", "x"])).toThrow(/unexpected argument "--seed"/);
  });
});
