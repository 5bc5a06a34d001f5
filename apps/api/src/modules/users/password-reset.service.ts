import type { PasswordResetRequest } from "../../auth/create-auth.js";
import { RESET_TOKEN_SECONDS } from "../../auth/create-auth.js";
import type { AppContext } from "../../context.js";
import { recordAudit } from "../audit/audit.service.js";

type ResetContext = Pick<AppContext, "models" | "mailer" | "sequelize"> & { config: Pick<AppContext["config"], "publicOrigin"> };

/** The web page that asks for the new password (apps/web config/paths.ts `resetPassword`). */
export function resetPasswordLink(publicOrigin: string, token: string): string {
  return `${publicOrigin}/reset-password?token=${encodeURIComponent(token)}`;
}

/**
 * Mails better-auth's one-time token as a link to the reset page. Not awaited: the request's
 * answer must take as long for a known address as for an unknown one, so nothing here may
 * wait on SMTP (the mailer never rejects and tracks the send for shutdown and tests).
 * A deactivated account gets no mail: a reset must not become a way back in.
 */
export function mailPasswordReset(ctx: ResetContext, request: PasswordResetRequest): void {
  if (request.banned) return;
  void ctx.mailer.send({
    to: [request.email],
    subject: "Reset your Plumeline password",
    text: [
      `Hello ${request.name},`,
      "",
      "Someone asked to reset the password of your Plumeline account. To choose a new one, open:",
      `  ${resetPasswordLink(ctx.config.publicOrigin, request.token)}`,
      "",
      `The link works once, within ${RESET_TOKEN_SECONDS / 60} minutes. If you did not ask, ignore this mail: your password stays as it is.`,
    ].join("\n"),
  });
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
