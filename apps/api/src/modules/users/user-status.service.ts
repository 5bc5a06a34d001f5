import type { User } from "@plumeline/contracts";
import type { AppContext } from "../../context.js";
import { forbidden, notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import { getUser } from "./users.service.js";

type StatusContext = Pick<AppContext, "models" | "auth">;

/**
 * Deactivation is better-auth's ban (admin plugin): it flags the user, deletes every session
 * they hold, and its session hook refuses new sign-ins with ACCOUNT_DEACTIVATED_MESSAGE.
 * Nothing is deleted, so runs, versions and audit rows stay attributed to them.
 *
 * `adminHeaders` are the acting admin's request headers: the plugin's endpoints check the
 * caller's own session (and its user:ban statement), so they are called as that admin.
 * The audit row follows the change rather than sharing its transaction: better-auth writes
 * through its adapter on its own connection, and SQLite would make the two wait on each other.
 */
export async function deactivateUser(ctx: StatusContext, actor: RequestUser, id: string, adminHeaders: Headers): Promise<User> {
  const row = await ctx.models.User.findByPk(id);
  if (!row) throw notFound("User", id);
  if (row.id === actor.id) throw forbidden("An admin cannot deactivate their own account; ask another admin.", "self_deactivation");
  if (row.banned) return getUser(ctx, id);
  await ctx.auth.api.banUser({ headers: adminHeaders, body: { userId: id, banReason: `Deactivated by ${actor.email}` } });
  await recordAudit(ctx, {
    actorId: actor.id,
    actorEmail: actor.email,
    action: "user.deactivated",
    entityType: "user",
    entityId: id,
    summary: `${actor.email} deactivated ${row.email}; their open sessions were ended.`,
    data: { email: row.email },
  });
  return getUser(ctx, id);
}

/** Lifts the ban: the user signs in again with the password they had. */
export async function reactivateUser(ctx: StatusContext, actor: RequestUser, id: string, adminHeaders: Headers): Promise<User> {
  const row = await ctx.models.User.findByPk(id);
  if (!row) throw notFound("User", id);
  if (!row.banned) return getUser(ctx, id);
  await ctx.auth.api.unbanUser({ headers: adminHeaders, body: { userId: id } });
  await recordAudit(ctx, {
    actorId: actor.id,
    actorEmail: actor.email,
    action: "user.reactivated",
    entityType: "user",
    entityId: id,
    summary: `${actor.email} reactivated ${row.email}.`,
    data: { email: row.email },
  });
  return getUser(ctx, id);
}
