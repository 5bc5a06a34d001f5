import { inputHash, resultHash } from "../hash/run-hashes.js";
import type { PathwayResult, PercentileSet, RunResult, RunSpec } from "../spec/types.js";
import { engineVersion } from "../version.js";

/** Puts the run together and stamps it: engine version, input hash, result hash. */
export function assembleResult(
  spec: RunSpec,
  pathways: PathwayResult[],
  implied: { ecs: PercentileSet; tcr: PercentileSet },
): RunResult {
  const result: RunResult = {
    engineVersion,
    inputHash: inputHash(spec),
    resultHash: "",
    members: spec.members,
    effectiveMembers: pathways[0]!.effectiveMembers,
    implied,
    pathways,
  };
  result.resultHash = resultHash(result);
  return result;
}
