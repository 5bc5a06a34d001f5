/**
 * Compile-time check, run by `tsc` with the engine's typecheck (it has no runtime part): the
 * engine restates the run spec and result shapes because its library imports nothing of ours,
 * so these lines prove the restated types and the contracts' zod-inferred types are assignable
 * BOTH ways. A field that is optional on one side and required on the other, or named or typed
 * differently, turns one of the constants below into `false` and fails the build. It lives
 * beside the CLI, the one part of the engine that may import the contracts.
 */
import type * as Contracts from "@plumeline/contracts";
import type * as Engine from "../spec/types.js";

/** `true` when From can be used where To is expected (no distribution over unions). */
type Assignable<From, To> = [From] extends [To] ? true : false;

export const specContractsToEngine: Assignable<Contracts.RunSpec, Engine.RunSpec> = true;
// The engine's peril profiles are deliberately wider than the contracts': it still reads the
// superseded `points` tables of older specs, which the contracts' schema rewrites as `tables`.
export const specEngineToContracts: Assignable<Omit<Engine.RunSpec, "perils">, Omit<Contracts.RunSpec, "perils">> = true;
export const specInputContractsToEngine: Assignable<Contracts.RunSpecInput, Engine.RunSpecInput> = true;
export const resultContractsToEngine: Assignable<Contracts.RunResult, Engine.RunResult> = true;
export const resultEngineToContracts: Assignable<Engine.RunResult, Contracts.RunResult> = true;
export const distributionContractsToEngine: Assignable<Contracts.Distribution, Engine.Distribution> = true;
export const distributionEngineToContracts: Assignable<Engine.Distribution, Contracts.Distribution> = true;
