import { randomUUID } from "node:crypto";
import {
  createPathwayBodySchema,
  pathwayMetadataSchema,
  type CreatePathwayBody,
  type Pathway,
  type PathwayPreview,
  type PathwaySummary,
  type UpdatePathwayBody,
  type ListPathwaysQuery,
  type PATHWAY_SORT_KEYS,
  type Page,
} from "@plumeline/contracts";
import { Op, type Transaction, type WhereOptions } from "sequelize";
import type { Literal } from "sequelize/lib/utils";
import { createdBetween } from "../../db/paging/date-range.js";
import { findPage, type SortColumns } from "../../db/paging/find-page.js";
import { anyContains, personMatches } from "../../db/paging/like-pattern.js";
import type { AppContext } from "../../context.js";
import { badRequest, conflict, forbidden, notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import { pathwayChecksum } from "./pathway-checksum.js";
import { assertFileGiven, readUploadedRows, type UploadedFile } from "../../uploads/tabular-file.js";
import { checkUpload } from "../../uploads/upload-problems.js";
import { checkSeriesShape, seriesAgents, seriesLength } from "./pathway-series.js";
import { checkPathwayRecipe } from "./pathway-recipe-check.js";
import { parsePathwayTable, type PathwaySeries } from "./pathway-table.js";
import type { PathwayModel } from "./pathway.model.js";

type Ctx = Pick<AppContext, "models" | "sequelize">;

export const PREVIEW_ROWS = 20;

export function toPathwaySummary(row: PathwayModel): PathwaySummary {
  const list = seriesAgents(row.agents);
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    source: row.source,
    vintage: row.vintage,
    startYear: row.startYear,
    endYear: row.endYear,
    agents: list.map((a) => a.agent),
    quantities: Object.fromEntries(list.map((a) => [a.agent, a.quantity])),
    checksum: row.checksum,
    locked: row.locked,
    createdBy: row.createdBy,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toPathway(row: PathwayModel): Pathway {
  return { ...toPathwaySummary(row), agents: row.agents as Pathway["agents"] };
}

const PATHWAY_SORT_COLUMNS: SortColumns<(typeof PATHWAY_SORT_KEYS)[number]> = {
  createdAt: ["createdAt"],
  name: ["name"],
  startYear: ["startYear", "name"],
  endYear: ["endYear", "name"],
};

/**
 * One page of pathways: `q` in name, description, source and vintage; `author` in the
 * uploader's name or email; locked; created from/to.
 */
export async function listPathways(ctx: Ctx, query: ListPathwaysQuery): Promise<Page<PathwaySummary>> {
  const conditions: Array<WhereOptions | Literal> = [...createdBetween(query)];
  if (query.locked) conditions.push({ locked: query.locked === "true" });
  if (query.q) conditions.push(anyContains(ctx.sequelize, ["name", "description", "source", "vintage"], query.q));
  if (query.author) conditions.push(personMatches(ctx.sequelize, "created_by", query.author));
  const { rows, total } = await findPage(ctx.models.Pathway, { conditions, page: query, sortColumns: PATHWAY_SORT_COLUMNS });
  return { items: rows.map(toPathwaySummary), total };
}

export async function findPathway(ctx: Ctx, id: string, transaction?: Transaction): Promise<PathwayModel> {
  const row = await ctx.models.Pathway.findByPk(id, transaction ? { transaction } : {});
  if (!row) throw notFound("Pathway", id);
  return row;
}

export async function getPathway(ctx: Ctx, id: string): Promise<Pathway> {
  return toPathway(await findPathway(ctx, id));
}

export async function createPathway(ctx: Ctx, user: RequestUser, body: CreatePathwayBody, origin = "json"): Promise<Pathway> {
  const input = createPathwayBodySchema.parse(body);
  const shape = checkSeriesShape(input.agents);
  if (shape.length > 0) throw badRequest(shape, "The pathway's series are inconsistent.");
  const agents = input.agents as PathwaySeries;
  const recipe = input.recipe ? await checkPathwayRecipe(ctx, input.recipe, { startYear: input.startYear, agents: input.agents }) : null;
  const row = await ctx.sequelize.transaction(async (transaction) => {
    const created = await ctx.models.Pathway.create(
      {
        id: randomUUID(),
        name: input.name,
        description: input.description,
        source: input.source,
        vintage: input.vintage,
        startYear: input.startYear,
        endYear: input.startYear + seriesLength(agents) - 1,
        agents,
        checksum: pathwayChecksum(input.startYear, agents),
        locked: false,
        createdBy: user.id,
      },
      { transaction },
    );
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "pathway.created",
        entityType: "pathway",
        entityId: created.id,
        summary: `Pathway "${created.name}" created from ${recipe ? `the composer (${recipe.summary})` : origin} (${created.startYear}–${created.endYear}, checksum ${created.checksum.slice(0, 12)}…).`,
        data: { checksum: created.checksum, source: created.source, vintage: created.vintage, origin: recipe ? "composer" : origin, ...(recipe ? { recipe: recipe.recipe } : {}) },
      },
      transaction,
    );
    return created;
  });
  return toPathway(row);
}

/** Editing is allowed only to the creator and only while no run or approved version uses the pathway. */
export async function updatePathway(ctx: Ctx, user: RequestUser, id: string, body: UpdatePathwayBody): Promise<Pathway> {
  const row = await findPathway(ctx, id);
  if (row.locked)
    throw conflict(
      `Pathway "${row.name}" is locked: a run or an approved model version uses it. Create a new pathway instead.`,
      "pathway_locked",
    );
  if (row.createdBy !== user.id) throw forbidden("Only the person who created a pathway can edit it.", "not_owner");
  const agents = (body.agents ?? row.agents) as PathwaySeries;
  const startYear = body.startYear ?? row.startYear;
  const shape = checkSeriesShape(agents);
  if (shape.length > 0) throw badRequest(shape, "The pathway's series are inconsistent.");
  const checksum = pathwayChecksum(startYear, agents);
  await ctx.sequelize.transaction(async (transaction) => {
    const [updated] = await ctx.models.Pathway.update(
      {
        ...(body.name !== undefined ? { name: body.name } : {}),
        ...(body.description !== undefined ? { description: body.description } : {}),
        ...(body.source !== undefined ? { source: body.source } : {}),
        ...(body.vintage !== undefined ? { vintage: body.vintage } : {}),
        startYear,
        endYear: startYear + seriesLength(agents) - 1,
        agents,
        checksum,
      },
      // Guarded: a run created since the read above locks the row and makes this a no-op.
      { where: { id, locked: false }, transaction },
    );
    if (updated !== 1) throw conflict(`Pathway "${row.name}" was locked meanwhile. Create a new pathway instead.`, "pathway_locked");
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "pathway.updated",
        entityType: "pathway",
        entityId: id,
        summary: `Pathway "${body.name ?? row.name}" edited (checksum ${row.checksum.slice(0, 12)}… -> ${checksum.slice(0, 12)}…).`,
        data: { before: row.checksum, after: checksum, fields: Object.keys(body) },
      },
      transaction,
    );
  });
  return getPathway(ctx, id);
}

/** Locks pathways for good (a run or an approved version now depends on their numbers). */
export async function lockPathways(ctx: Ctx, ids: string[], transaction: Transaction): Promise<void> {
  if (ids.length === 0) return;
  await ctx.models.Pathway.update({ locked: true }, { where: { id: { [Op.in]: ids }, locked: false }, transaction });
}


/**
 * Parses an uploaded CSV/XLSX. With `preview` it only reports what it read; otherwise the
 * metadata fields must be valid too and the pathway is created. Problems in the file and in
 * the fields come back together in one 400; nothing is saved unless everything is valid.
 */
export async function uploadPathway(
  ctx: Ctx,
  user: RequestUser,
  file: UploadedFile | undefined,
  fields: { name?: string; description?: string; source?: string; vintage?: string; preview: boolean },
): Promise<{ preview: PathwayPreview } | { pathway: Pathway }> {
  assertFileGiven(file);
  const rows = await readUploadedRows(file);
  const { read: parsed, fields: metadata } = checkUpload(parsePathwayTable(rows), fields.preview, pathwayMetadataSchema, {
    name: fields.name,
    description: fields.description,
    source: fields.source,
    vintage: fields.vintage,
  });

  if (fields.preview)
    return {
      preview: {
        startYear: parsed.table.startYear,
        endYear: parsed.table.endYear,
        agents: parsed.table.columns.map((c) => ({ agent: c.agent, quantity: c.quantity, column: c.header })),
        rows: parsed.table.rows.slice(0, PREVIEW_ROWS),
        series: parsed.table.agents as PathwayPreview["series"],
      },
    };
  const pathway = await createPathway(
    ctx,
    user,
    { ...metadata!, startYear: parsed.table.startYear, agents: parsed.table.agents as CreatePathwayBody["agents"] },
    `upload ${file.originalname}`,
  );
  return { pathway };
}
