import type { AuditEvent, AuditQuery } from "@plumeline/contracts";
import { Op, type Transaction, type WhereOptions } from "sequelize";
import type { Models } from "../../db/models.js";
import type { AuditEventModel } from "./audit-event.model.js";

export interface AuditInput {
  /** The user who acted; null for the system or an anonymous caller (e.g. a failed sign-in). */
  actorId: string | null;
  actorEmail?: string | null;
  /** Dotted verb, e.g. "user.invited", "model-version.approved", "auth.sign-in-failed". */
  action: string;
  entityType: string;
  entityId?: string | number | null;
  /** One human sentence for the audit screen. */
  summary: string;
  data?: unknown;
}

/**
 * Appends one audit row. Pass the caller's transaction so the row commits (or rolls back)
 * with the change it records. There is deliberately no update or delete counterpart.
 */
export async function recordAudit(ctx: { models: Models }, input: AuditInput, transaction?: Transaction): Promise<AuditEvent> {
  const { AuditEvent, User } = ctx.models;
  let actorEmail = input.actorEmail ?? null;
  if (actorEmail === null && input.actorId) {
    const actor = await User.findByPk(input.actorId, { attributes: ["email"], ...(transaction ? { transaction } : {}) });
    actorEmail = actor?.email ?? null;
  }
  const row = await AuditEvent.create(
    {
      actorId: input.actorId,
      actorEmail,
      action: input.action,
      entityType: input.entityType,
      entityId: input.entityId === undefined || input.entityId === null ? null : String(input.entityId),
      summary: input.summary,
      data: input.data ?? null,
    },
    transaction ? { transaction } : {},
  );
  return toAuditEvent(row);
}

/** Filtered, newest-first page of the audit trail. */
export async function listAudit(ctx: { models: Models }, query: AuditQuery): Promise<{ items: AuditEvent[]; total: number }> {
  const where: Record<string | symbol, unknown> = {};
  if (query.action) where.action = query.action;
  if (query.entityType) where.entityType = query.entityType;
  if (query.entityId) where.entityId = query.entityId;
  if (query.actorId) where.actorId = query.actorId;
  const range: Record<symbol, Date> = {};
  if (query.from) range[Op.gte] = startOf(query.from);
  if (query.to) range[Op.lte] = endOf(query.to);
  if (query.from || query.to) where.createdAt = range;
  const { rows, count } = await ctx.models.AuditEvent.findAndCountAll({
    where: where as WhereOptions,
    order: [["createdAt", "DESC"], ["id", "DESC"]],
    limit: query.limit,
    offset: query.offset,
  });
  return { items: rows.map(toAuditEvent), total: count };
}

/** A bare date means the whole day: `from` at its first instant, `to` at its last. */
function startOf(value: string): Date {
  return new Date(/^\d{4}-\d{2}-\d{2}$/.test(value) ? `${value}T00:00:00.000Z` : value);
}
function endOf(value: string): Date {
  return new Date(/^\d{4}-\d{2}-\d{2}$/.test(value) ? `${value}T23:59:59.999Z` : value);
}

export function toAuditEvent(row: AuditEventModel): AuditEvent {
  return {
    id: row.id,
    actorId: row.actorId,
    actorEmail: row.actorEmail,
    action: row.action,
    entityType: row.entityType,
    entityId: row.entityId,
    summary: row.summary,
    data: row.data ?? null,
    createdAt: row.createdAt.toISOString(),
  };
}
