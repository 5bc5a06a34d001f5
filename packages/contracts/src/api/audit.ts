import { z } from "zod";
import { listDateSchema, pagedQuerySchema, pageSchema, type ListQueryInput } from "./paging.js";

/** One append-only audit row: who did what to which entity, when. */
export const auditEventSchema = z.object({
  id: z.number().int(),
  actorId: z.string().nullable(),
  actorEmail: z.string().nullable(),
  action: z.string(),
  entityType: z.string(),
  entityId: z.string().nullable(),
  summary: z.string(),
  data: z.unknown().nullable(),
  /** The actor's name today (null for the system or an unknown address). */
  actorName: z.string().nullable(),
  /** The entity's name today, e.g. the run's name or "Core v2" (null when gone or nameless). */
  entityName: z.string().nullable(),
  createdAt: z.string(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

export const AUDIT_SORT_KEYS = ["createdAt", "action", "entityType"] as const;
/**
 * The audit row for a successful sign-in. These are most of the trail on a busy day, so the
 * screen hides them by default; failed and slowed sign-ins stay visible because they are
 * what a security review looks for.
 */
export const SIGN_IN_ACTION = "auth.signed-in";

/**
 * GET /api/audit (and /api/audit.csv) query string. `q` searches the summary, the action,
 * the entity type and the actor's name and email; `actor` names a person (name or email),
 * `entity` a thing (a run's, pathway's, model version's, peril profile's or user's name);
 * from/to are ISO dates or date-times (inclusive).
 */
export const auditQuerySchema = pagedQuerySchema(AUDIT_SORT_KEYS, "createdAt:desc").extend({
  action: z.string().min(1).optional(),
  entityType: z.string().min(1).optional(),
  entityId: z.string().min(1).optional(),
  actorId: z.string().min(1).optional(),
  actor: z.string().trim().min(1).max(200).optional(),
  entity: z.string().trim().min(1).max(200).optional(),
  hideSignIns: z.enum(["true", "false"], { error: 'must be "true" or "false"' }).optional(),
  from: listDateSchema.optional(),
  to: listDateSchema.optional(),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;
export type AuditQueryInput = ListQueryInput<typeof auditQuerySchema>;

export const auditPageSchema = pageSchema(auditEventSchema).extend({
  /** Sign-in rows that matched the other filters but were hidden (0 when none were hidden). */
  hiddenSignIns: z.number().int().min(0),
});
export type AuditPage = z.infer<typeof auditPageSchema>;
