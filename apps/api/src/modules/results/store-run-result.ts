import type { RunResult } from "@plumeline/contracts";
import type { Transaction } from "sequelize";
import type { Models } from "../../db/models.js";

/** Rows per INSERT: small statements, so the server thread gets turns between them. */
const CHUNK = 500;

export interface ResultRowInput {
  runId: string;
  pathwayId: string;
  variable: string;
  year: number;
  statistic: string;
  value: number | null;
}

/**
 * The per-year statistics of a result in long form: temperature / forcing / imbalance with one
 * row per percentile key and the mean, and exceedance with one row per threshold (statistic =
 * the threshold in K). Cost: pathways x years x (statistics + thresholds) rows.
 */
export function resultRows(runId: string, result: RunResult): ResultRowInput[] {
  const rows: ResultRowInput[] = [];
  for (const p of result.pathways) {
    const variables: Array<[string, Record<string, number[]>]> = [
      ["temperature", p.temperature],
      ["forcing", p.forcing],
      ["imbalance", p.imbalance],
      ["exceedance", p.exceedance],
    ];
    for (const [variable, series] of variables)
      for (const [statistic, values] of Object.entries(series))
        p.years.forEach((year, i) => {
          const v = values[i];
          rows.push({ runId, pathwayId: p.id, variable, year, statistic, value: v === undefined || !Number.isFinite(v) ? null : v });
        });
  }
  return rows;
}

/** Writes the full result and its per-year rows inside the caller's transaction. */
export async function storeRunResult(models: Models, runId: string, result: RunResult, transaction: Transaction): Promise<void> {
  await models.RunResult.create(
    { runId, engineVersion: result.engineVersion, inputHash: result.inputHash, resultHash: result.resultHash, result },
    { transaction },
  );
  const rows = resultRows(runId, result);
  for (let i = 0; i < rows.length; i += CHUNK)
    await models.RunResultRow.bulkCreate(rows.slice(i, i + CHUNK) as unknown as Array<Record<string, unknown>>, { transaction, validate: false, hooks: false });
}
