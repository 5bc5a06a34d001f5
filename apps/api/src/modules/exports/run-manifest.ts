import type { RunResult } from "@plumeline/contracts";
import { Op } from "sequelize";
import type { AppContext } from "../../context.js";
import type { RunModel } from "../runs/run.model.js";
import type { WorkbookManifest } from "./workbook-builder.js";

type Ctx = Pick<AppContext, "models">;

/**
 * What every export states about its run, read from the database (never the request): the run,
 * its model version and approval, the pathways with source, vintage and checksum, the seed and
 * members, the hashes, and the reliance and limitation statements. `exporter` and `exportedAt`
 * are given so a past export can be rebuilt exactly as it was first handed out.
 */
export async function gatherRunManifest(
  ctx: Ctx,
  run: RunModel,
  result: RunResult,
  exporter: { name: string; email: string },
  exportedAt: Date,
): Promise<WorkbookManifest> {
  const version = await ctx.models.ModelVersion.findByPk(run.modelVersionId);
  const pathways = await ctx.models.Pathway.findAll({ where: { id: { [Op.in]: run.pathwayIds } } });
  const statements = await ctx.models.RunStatement.findAll({
    where: { runId: run.id, createdAt: { [Op.lte]: exportedAt } },
    order: [["createdAt", "ASC"], ["id", "ASC"]],
  });
  const userIds = [run.createdBy, version?.decidedBy, ...statements.map((s) => s.createdBy)].filter((x): x is string => !!x);
  const users = await ctx.models.User.findAll({ where: { id: { [Op.in]: userIds } }, attributes: ["id", "name", "email"] });
  const who = (id: string | null | undefined) => {
    const u = users.find((x) => x.id === id);
    return u ? `${u.name} <${u.email}>` : null;
  };
  const byId = new Map(pathways.map((p) => [p.id, p]));
  return {
    runId: run.id,
    runName: run.name,
    exploratory: run.exploratory,
    createdBy: who(run.createdBy) ?? run.createdBy,
    createdAt: run.createdAt.toISOString(),
    finishedAt: run.finishedAt?.toISOString() ?? null,
    modelVersion: {
      id: run.modelVersionId,
      name: version?.name ?? "?",
      versionNumber: version?.versionNumber ?? 0,
      status: version?.status ?? "?",
      changeClass: version?.changeClass ?? null,
      decidedBy: who(version?.decidedBy),
      decidedAt: version?.decidedAt?.toISOString() ?? null,
    },
    pathways: run.pathwayIds.map((id) => {
      const p = byId.get(id);
      return { id, name: p?.name ?? "?", source: p?.source ?? "", vintage: p?.vintage ?? "", startYear: p?.startYear ?? 0, endYear: p?.endYear ?? 0, checksum: p?.checksum ?? "" };
    }),
    seed: run.seed,
    members: run.members,
    sampling: run.sampling,
    baseline: run.spec.baseline,
    percentiles: run.spec.percentiles,
    thresholds: run.spec.thresholds,
    horizons: run.spec.horizons,
    engineVersion: result.engineVersion,
    inputHash: result.inputHash,
    resultHash: result.resultHash,
    exportedBy: `${exporter.name} <${exporter.email}>`,
    exportedAt: exportedAt.toISOString(),
    statements: statements.map((s) => ({ kind: s.kind, text: s.text, by: who(s.createdBy) ?? s.createdBy, at: s.createdAt.toISOString() })),
  };
}
