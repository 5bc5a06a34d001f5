import { randomUUID } from "node:crypto";
import {
  portfolioMetadataSchema,
  type Portfolio,
  type PortfolioPreview,
  type PortfolioRecord,
  type PortfolioRow,
  type PortfolioSummary,
} from "@plumeline/contracts";
import { Op, type Transaction } from "sequelize";
import type { AppContext } from "../../context.js";
import { notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import { assertFileGiven, readUploadedRows, type UploadedFile } from "../../uploads/tabular-file.js";
import { checkUpload } from "../../uploads/upload-problems.js";
import { portfolioChecksum } from "./portfolio-checksum.js";
import { parsePortfolioTable } from "./portfolio-table.js";
import type { PortfolioModel } from "./portfolio.model.js";

type Ctx = Pick<AppContext, "models" | "sequelize">;

const distinct = (values: string[]) => [...new Set(values)];

function toSummary(row: PortfolioModel, createdByName: string | null): PortfolioSummary {
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    rowCount: row.rowCount,
    regions: distinct(row.rows.map((r) => r.region)),
    perils: distinct(row.rows.map((r) => r.peril)),
    currencies: distinct(row.rows.map((r) => r.currency)),
    checksum: row.checksum,
    fileName: row.fileName,
    createdBy: row.createdBy,
    createdByName,
    createdAt: row.createdAt.toISOString(),
  };
}

async function userNames(ctx: Ctx, ids: string[]): Promise<Map<string, string>> {
  const users = await ctx.models.User.findAll({ where: { id: { [Op.in]: distinct(ids) } }, attributes: ["id", "name"] });
  return new Map(users.map((u) => [u.id, u.name]));
}

export async function listPortfolios(ctx: Ctx): Promise<PortfolioSummary[]> {
  const rows = await ctx.models.Portfolio.findAll({ order: [["createdAt", "DESC"], ["name", "ASC"]] });
  const names = await userNames(ctx, rows.map((r) => r.createdBy));
  return rows.map((r) => toSummary(r, names.get(r.createdBy) ?? null));
}

export async function findPortfolio(ctx: Pick<Ctx, "models">, id: string, transaction?: Transaction): Promise<PortfolioModel> {
  const row = await ctx.models.Portfolio.findByPk(id, transaction ? { transaction } : {});
  if (!row) throw notFound("Portfolio", id);
  return row;
}

export async function getPortfolio(ctx: Ctx, id: string): Promise<PortfolioRecord> {
  const row = await findPortfolio(ctx, id);
  const names = await userNames(ctx, [row.createdBy]);
  return { ...toSummary(row, names.get(row.createdBy) ?? null), rows: row.rows };
}

/** The engine's view of a stored portfolio (what a run spec carries: its rows, copied). */
export function toEnginePortfolio(row: PortfolioModel): Portfolio {
  return { id: row.id, name: row.name, rows: row.rows };
}

/** Saves parsed rows as a portfolio, with its audit row, in one transaction. */
export async function createPortfolio(
  ctx: Ctx,
  user: Pick<RequestUser, "id">,
  input: { id?: string; name: string; description: string; rows: PortfolioRow[]; fileName: string },
): Promise<PortfolioRecord> {
  const checksum = portfolioChecksum(input.rows);
  const id = input.id ?? randomUUID();
  await ctx.sequelize.transaction(async (transaction) => {
    await ctx.models.Portfolio.create(
      { id, name: input.name, description: input.description, rows: input.rows, rowCount: input.rows.length, checksum, fileName: input.fileName, createdBy: user.id },
      { transaction },
    );
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "portfolio.uploaded",
        entityType: "portfolio",
        entityId: id,
        summary: `Portfolio "${input.name}" uploaded from ${input.fileName}: ${input.rows.length} row${input.rows.length === 1 ? "" : "s"}, checksum ${checksum.slice(0, 12)}….`,
        data: { checksum, rowCount: input.rows.length, fileName: input.fileName },
      },
      transaction,
    );
  });
  return getPortfolio(ctx, id);
}


/**
 * Parses an uploaded CSV/XLSX portfolio. With `preview` it only reports what it read; otherwise
 * the name must be given too and the portfolio is saved. File and field problems come back
 * together in one 400 naming row and column; nothing is saved unless everything is valid.
 */
export async function uploadPortfolio(
  ctx: Ctx,
  user: RequestUser,
  file: UploadedFile | undefined,
  fields: { name?: string; description?: string; preview: boolean },
): Promise<{ preview: PortfolioPreview } | { portfolio: PortfolioRecord }> {
  assertFileGiven(file);
  const raw = await readUploadedRows(file);
  const { read: table, fields: metadata } = checkUpload(parsePortfolioTable(raw), fields.preview, portfolioMetadataSchema, {
    name: fields.name,
    description: fields.description,
  });
  if (fields.preview)
    return {
      preview: {
        rows: table.rows,
        rowCount: table.rows.length,
        currencies: distinct(table.rows.map((r) => r.currency)),
        checksum: portfolioChecksum(table.rows),
      },
    };
  const portfolio = await createPortfolio(ctx, user, { ...metadata!, rows: table.rows, fileName: file.originalname });
  return { portfolio };
}
