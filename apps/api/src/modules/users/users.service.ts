import type { InviteUserBody, Role, UpdateUserBody, User } from "@plumeline/contracts";
import type { AppContext } from "../../context.js";
import { conflict, forbidden, notFound } from "../../errors/app-error.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";
import type { UserModel } from "./user.model.js";

type UsersContext = Pick<AppContext, "models" | "auth" | "mailer" | "config" | "sequelize">;

export async function listUsers(ctx: Pick<AppContext, "models">): Promise<User[]> {
  const rows = await ctx.models.User.findAll({ order: [["name", "ASC"], ["email", "ASC"]] });
  return rows.map(toUser);
}

export async function getUser(ctx: Pick<AppContext, "models">, id: string): Promise<User> {
  const row = await ctx.models.User.findByPk(id);
  if (!row) throw notFound("User", id);
  return toUser(row);
}

/** Addresses of everyone holding `role`, e.g. the managers to notify of a submission. */
export async function emailsOfRole(ctx: Pick<AppContext, "models">, role: Role): Promise<string[]> {
  const rows = await ctx.models.User.findAll({ where: { role }, attributes: ["email"], order: [["email", "ASC"]] });
  return rows.map((r) => r.email);
}

/**
 * Invites a colleague: creates the user through better-auth without any password (so nothing
 * can sign them in yet), audits the invitation, then asks better-auth for its one-time reset
 * token, the same one "Forgot password?" uses. The mail hook (password-reset.service.ts) sees
 * the pending invitation and words the mail as an invitation with the link; no password is
 * ever made up, mailed or stored in the outbox.
 */
export async function inviteUser(ctx: UsersContext, actor: RequestUser, body: InviteUserBody): Promise<User> {
  const email = body.email.toLowerCase();
  if (await ctx.models.User.findOne({ where: { email } })) throw conflict(`A user with the email ${email} already exists.`, "email_taken");
  const { user } = await ctx.auth.api.createUser({ body: { email, name: body.name, role: body.role } });
  // Marks the invitation as pending until the person sets their password through the link.
  await ctx.models.User.update({ mustChangePassword: true }, { where: { id: user.id } });
  await recordAudit(ctx, {
    actorId: actor.id,
    actorEmail: actor.email,
    action: "user.invited",
    entityType: "user",
    entityId: user.id,
    summary: `${actor.email} invited ${email} as ${body.role}; a one-time link to set a password was mailed.`,
    data: { email, name: body.name, role: body.role },
  });
  await ctx.auth.api.requestPasswordReset({ body: { email } });
  return getUser(ctx, user.id);
}

/**
 * Changes a user's role with the reason, audited in the same transaction. No admin changes
 * their own role: granting or removing one's own rights needs a second admin.
 */
export async function changeRole(ctx: UsersContext, actor: RequestUser, id: string, change: UpdateUserBody): Promise<User> {
  const { role, reason } = change;
  return ctx.sequelize.transaction(async (transaction) => {
    const row = await ctx.models.User.findByPk(id, { transaction });
    if (!row) throw notFound("User", id);
    if (row.id === actor.id) throw forbidden("An admin cannot change their own role; ask another admin.", "self_role_change");
    const previous = row.role;
    if (previous === role) return toUser(row);
    await row.update({ role, updatedAt: new Date() }, { transaction });
    await recordAudit(
      ctx,
      {
        actorId: actor.id,
        actorEmail: actor.email,
        action: "user.role-changed",
        entityType: "user",
        entityId: row.id,
        summary: `${actor.email} changed the role of ${row.email} from ${previous} to ${role}. Reason: ${reason}`,
        data: { from: previous, to: role, reason },
      },
      transaction,
    );
    return toUser(row);
  });
}

export function toUser(row: UserModel): User {
  return { id: row.id, email: row.email, name: row.name, role: row.role, createdAt: row.createdAt.toISOString(), deactivated: Boolean(row.banned) };
}
