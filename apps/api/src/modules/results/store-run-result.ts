import type { RunResult } from "@plumeline/contracts";
import type { Transaction } from "sequelize";
import type { Models } from "../../db/models.js";
import { compressResult, RESULT_ENCODING, type ResultDocument } from "./result-document.js";

/**
 * Writes a run's result inside the caller's transaction: one row holding the compressed
 * document, so the transaction that also marks the run succeeded stays short whatever the
 * result's size. `compressed`: the same result already compressed (as it came back through
 * the queue), stored as it is.
 */
export async function storeRunResult(
  models: Models,
  runId: string,
  result: RunResult,
  transaction: Transaction,
  compressed: ResultDocument = compressResult(result),
): Promise<void> {
  await models.RunResult.create(
    {
      runId,
      engineVersion: result.engineVersion,
      inputHash: result.inputHash,
      resultHash: result.resultHash,
      encoding: RESULT_ENCODING,
      jsonBytes: compressed.jsonBytes,
      document: compressed.document,
    },
    { transaction },
  );
}
