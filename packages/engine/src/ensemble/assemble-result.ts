import { inputHash, resultHash } from "../hash/run-hashes.js";
import type { PerilResult } from "../peril/types.js";
import type { PathwayResult, PercentileSet, RunResult, RunSpec } from "../spec/types.js";
import { engineVersion } from "../version.js";

/**
 * Puts the run together and stamps it: engine version, input hash, result hash. `perils` is
 * set only when the spec carried peril profiles, so results without them hash as before.
 */
export function assembleResult(
  spec: RunSpec,
  pathways: PathwayResult[],
  implied: { ecs: PercentileSet; tcr: PercentileSet },
  perils?: PerilResult,
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
  if (perils) result.perils = perils;
  result.resultHash = resultHash(result);
  return result;
}
