import type { RunResult } from "@plumeline/contracts";
import type { AppContext } from "../../context.js";
import { conflict } from "../../errors/app-error.js";
import { findRun } from "../runs/runs.service.js";
import type { RunModel } from "../runs/run.model.js";
import { decompressResult } from "./result-document.js";

type Ctx = Pick<AppContext, "models">;

/** The run and its stored compressed result; 404 for an unknown run, 409 while it has no result. */
export async function getStoredResult(ctx: Ctx, runId: string): Promise<{ run: RunModel; document: Buffer }> {
  const run = await findRun(ctx, runId);
  if (run.status !== "succeeded") throw conflict(`Run "${run.name}" is ${run.status}; it has no result yet.`, "result_not_ready");
  const stored = await ctx.models.RunResult.findByPk(runId, { attributes: ["runId", "document"] });
  if (!stored) throw conflict(`Run "${run.name}" has no stored result.`, "result_not_ready");
  return { run, document: stored.document };
}

/** The run and its engine result, decompressed. */
export async function getRunWithResult(ctx: Ctx, runId: string): Promise<{ run: RunModel; result: RunResult }> {
  const { run, document } = await getStoredResult(ctx, runId);
  return { run, result: decompressResult(document) };
}
