import type { PasswordResetRequest } from "../../auth/create-auth.js";
import { RESET_TOKEN_SECONDS } from "../../auth/create-auth.js";
import type { AppContext } from "../../context.js";
import { recordAudit } from "../audit/audit.service.js";

type ResetContext = Pick<AppContext, "models" | "mailer" | "sequelize"> & { config: Pick<AppContext["config"], "publicOrigin"> };

export const INVITATION_SUBJECT = "You are invited to Plumeline";
export const RESET_SUBJECT = "Reset your Plumeline password";

/** The web page that asks for the new password (apps/web config/paths.ts `resetPassword`). */
export function resetPasswordLink(publicOrigin: string, token: string): string {
  return `${publicOrigin}/reset-password?token=${encodeURIComponent(token)}`;
}

/**
 * Mails better-auth's one-time token as a link to the reset page. Not awaited: the request's
 * answer must take as long for a known address as for an unknown one, so nothing here may
 * wait on SMTP (the mailer never rejects and tracks the send for shutdown and tests).
 * A deactivated account gets no mail: a reset must not become a way back in.
 * A pending invitation (users.service.ts inviteUser) gets the same link worded as the invitation.
 */
export function mailPasswordReset(ctx: ResetContext, request: PasswordResetRequest): void {
  if (request.banned) return;
  const link = resetPasswordLink(ctx.config.publicOrigin, request.token);
  const minutes = RESET_TOKEN_SECONDS / 60;
  void ctx.mailer.send(
    request.pendingInvitation
      ? {
          to: [request.email],
          subject: INVITATION_SUBJECT,
          text: [
            `Hello ${request.name},`,
            "",
            `You have been invited to Plumeline as ${request.role}. To choose your password, open:`,
            `  ${link}`,
            "",
            `The link works once, within ${minutes} minutes. If it has expired, use "Forgot password?" on the sign-in page with this address for a new one.`,
          ].join("\n"),
        }
      : {
          to: [request.email],
          subject: RESET_SUBJECT,
          text: [
            `Hello ${request.name},`,
            "",
            "Someone asked to reset the password of your Plumeline account. To choose a new one, open:",
            `  ${link}`,
            "",
            `The link works once, within ${minutes} minutes. If you did not ask, ignore this mail: your password stays as it is.`,
          ].join("\n"),
        },
  );
}

/**
 * Audits a completed reset (never the token or the password). The user chose this password
 * themselves, so an invitation's one-time-password restriction no longer applies either.
 */
export async function recordPasswordReset(ctx: ResetContext, userId: string): Promise<void> {
  await ctx.sequelize.transaction(async (transaction) => {
    const user = await ctx.models.User.findByPk(userId, { transaction });
    await ctx.models.User.update({ mustChangePassword: false }, { where: { id: userId }, transaction });
    await recordAudit(
      ctx,
      {
        actorId: userId,
        actorEmail: user?.email ?? null,
        action: "user.password-reset",
        entityType: "user",
        entityId: userId,
        summary: `${user?.email ?? "A user"} set a new password through a mailed reset link; their sessions were ended.`,
      },
      transaction,
    );
  });
}
