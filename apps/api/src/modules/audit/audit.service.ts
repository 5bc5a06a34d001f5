import { SIGN_IN_ACTION, type AUDIT_SORT_KEYS, type AuditEvent, type AuditPage, type AuditQuery } from "@plumeline/contracts";
import { literal, Op, type Sequelize, type Transaction, type WhereOptions } from "sequelize";
import type { Literal } from "sequelize/lib/utils";
import { createdBetween } from "../../db/paging/date-range.js";
import { findPage, type SortColumns } from "../../db/paging/find-page.js";
import { anyContains, idNamed } from "../../db/paging/like-pattern.js";
import { csvRecord } from "../exports/csv-writer.js";
import { auditNames, ENTITY_NAME_SOURCES } from "./audit-names.js";
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

const AUDIT_SORT_COLUMNS: SortColumns<(typeof AUDIT_SORT_KEYS)[number]> = {
  createdAt: ["createdAt"],
  action: ["action", "createdAt"],
  entityType: ["entityType", "createdAt"],
};

/** The filters of an audit query as where conditions (sign-in hiding aside). */
function auditConditions(ctx: { sequelize: Sequelize }, query: AuditQuery): Array<WhereOptions | Literal> {
  const { sequelize } = ctx;
  const conditions: Array<WhereOptions | Literal> = [...createdBetween(query)];
  if (query.action) conditions.push({ action: query.action });
  if (query.entityType) conditions.push({ entityType: query.entityType });
  if (query.entityId) conditions.push({ entityId: query.entityId });
  if (query.actorId) conditions.push({ actorId: query.actorId });
  // A failed sign-in has no actor id, only the address typed, so the email is searched too.
  const actorByName = (text: string) => idNamed(sequelize, "actor_id", "users", ["name", "email"], text);
  if (query.actor) conditions.push(anyContains(sequelize, ["actor_email"], query.actor, [actorByName(query.actor)]));
  if (query.entity) conditions.push(entityNamed(sequelize, query.entity));
  if (query.q) conditions.push(anyContains(sequelize, ["summary", "action", "entity_type", "actor_email"], query.q, [actorByName(query.q)]));
  return conditions;
}

/** The row's entity (of any type that has a name) is named like the text. */
function entityNamed(sequelize: Sequelize, text: string): Literal {
  const perType = Object.entries(ENTITY_NAME_SOURCES).map(
    ([type, source]) => `(entity_type = ${sequelize.escape(type)} AND ${idNamed(sequelize, "entity_id", source.table, source.nameColumns, text)})`,
  );
  return literal(`(${perType.join(" OR ")})`);
}

/**
 * Filtered page of the audit trail (newest first by default) with each row's actor and
 * entity named. With `hideSignIns=true` successful sign-ins are left out and counted instead.
 */
export async function listAudit(ctx: { models: Models; sequelize: Sequelize }, query: AuditQuery): Promise<AuditPage> {
  const conditions = auditConditions(ctx, query);
  const hide = query.hideSignIns === "true";
  const [{ rows, total }, hiddenSignIns] = await Promise.all([
    findPage(ctx.models.AuditEvent, { conditions: hide ? [...conditions, { action: { [Op.ne]: SIGN_IN_ACTION } }] : conditions, page: query, sortColumns: AUDIT_SORT_COLUMNS }),
    hide ? ctx.models.AuditEvent.count({ where: { [Op.and]: [...conditions, { action: SIGN_IN_ACTION }] } }) : Promise.resolve(0),
  ]);
  return { items: await presentAudit(ctx.models, rows), total, hiddenSignIns };
}

/** Rows per database read while writing the CSV: bounds memory whatever the trail's size. */
const CSV_BATCH_ROWS = 500;
export const AUDIT_CSV_COLUMNS = ["time_utc", "action", "actor_name", "actor_email", "entity_type", "entity_id", "entity_name", "summary"];

/**
 * The whole filtered trail as CSV (header row, ISO 8601 UTC times), in the query's sort
 * order, ignoring limit/offset: `write` receives it in batches so a long trail streams.
 */
export async function writeAuditCsv(ctx: { models: Models; sequelize: Sequelize }, query: AuditQuery, write: (chunk: string) => void): Promise<number> {
  const conditions = auditConditions(ctx, query);
  if (query.hideSignIns === "true") conditions.push({ action: { [Op.ne]: SIGN_IN_ACTION } });
  write(csvRecord(AUDIT_CSV_COLUMNS));
  let written = 0;
  for (;;) {
    const { rows } = await findPage(ctx.models.AuditEvent, { conditions, page: { sort: query.sort, limit: CSV_BATCH_ROWS, offset: written }, sortColumns: AUDIT_SORT_COLUMNS });
    const events = await presentAudit(ctx.models, rows);
    write(events.map((e) => csvRecord([e.createdAt, e.action, e.actorName, e.actorEmail, e.entityType, e.entityId, e.entityName, e.summary])).join(""));
    written += rows.length;
    if (rows.length < CSV_BATCH_ROWS) return written;
  }
}

async function presentAudit(models: Models, rows: AuditEventModel[]): Promise<AuditEvent[]> {
  const names = await auditNames(models, rows);
  return rows.map((row) => ({
    ...toAuditEvent(row),
    actorName: row.actorId ? (names.actor.get(row.actorId) ?? null) : null,
    entityName: row.entityId ? (names.entity.get(`${row.entityType}:${row.entityId}`) ?? null) : null,
  }));
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
    actorName: null,
    entityName: null,
    createdAt: row.createdAt.toISOString(),
  };
}
