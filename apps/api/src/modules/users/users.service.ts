import { randomBytes } from "node:crypto";
import type { InviteUserBody, Role, User } from "@plumeline/contracts";
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

/** A temporary password: 18 random bytes, base64url (24 characters, 144 bits). */
export function generateTemporaryPassword(): string {
  return randomBytes(18).toString("base64url");
}

/**
 * Invites a colleague: creates the user with a generated password through better-auth (which
 * hashes it and creates the credential), audits the invitation and mails the password.
 */
export async function inviteUser(ctx: UsersContext, actor: RequestUser, body: InviteUserBody): Promise<User> {
  const email = body.email.toLowerCase();
  if (await ctx.models.User.findOne({ where: { email } })) throw conflict(`A user with the email ${email} already exists.`, "email_taken");
  const password = generateTemporaryPassword();
  const { user } = await ctx.auth.api.createUser({ body: { email, name: body.name, password, role: body.role } });
  await ctx.models.User.update({ mustChangePassword: true }, { where: { id: user.id } });
  await recordAudit(ctx, {
    actorId: actor.id,
    actorEmail: actor.email,
    action: "user.invited",
    entityType: "user",
    entityId: user.id,
    summary: `${actor.email} invited ${email} as ${body.role}.`,
    data: { email, name: body.name, role: body.role },
  });
  await ctx.mailer.send({
    to: [email],
    subject: "Your Plumeline account",
    text: [
      `Hello ${body.name},`,
      "",
      `${actor.name} has invited you to Plumeline as ${body.role}.`,
      `Sign in at ${ctx.config.publicOrigin} with`,
      `  email:    ${email}`,
      `  password: ${password}`,
      "",
      "This password works once: after signing in you will be asked to choose your own before anything else.",
    ].join("\n"),
  });
  return getUser(ctx, user.id);
}

/** Changes a user's role, audited in the same transaction. An admin cannot demote themselves. */
export async function changeRole(ctx: UsersContext, actor: RequestUser, id: string, role: Role): Promise<User> {
  return ctx.sequelize.transaction(async (transaction) => {
    const row = await ctx.models.User.findByPk(id, { transaction });
    if (!row) throw notFound("User", id);
    if (row.id === actor.id && row.role === "admin" && role !== "admin") {
      throw forbidden("An admin cannot remove their own admin role; ask another admin.", "self_demotion");
    }
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
        summary: `${actor.email} changed the role of ${row.email} from ${previous} to ${role}.`,
        data: { from: previous, to: role },
      },
      transaction,
    );
    return toUser(row);
  });
}

export function toUser(row: UserModel): User {
  return { id: row.id, email: row.email, name: row.name, role: row.role, createdAt: row.createdAt.toISOString(), deactivated: Boolean(row.banned) };
}
