import type { Sequelize } from "sequelize";
import { createAuth, type Auth } from "./auth/create-auth.js";
import type { Config } from "./config.js";
import { openDatabase } from "./db/database.js";
import { initModels, type Models } from "./db/models.js";
import { startEmbeddedSmtpServer, type EmbeddedSmtpServer } from "./mail/embedded-smtp-server.js";
import { createMailer, type Mailer } from "./mail/mailer.js";
import { recordAudit } from "./modules/audit/audit.service.js";
import { storeReceivedMail } from "./modules/outbox/outbox.service.js";
import { mailPasswordReset, recordPasswordReset } from "./modules/users/password-reset.service.js";

/** Everything a service needs, built once per process (or per test file). Never req/res. */
export interface AppContext {
  config: Config;
  sequelize: Sequelize;
  models: Models;
  auth: Auth;
  mailer: Mailer;
  /** The embedded SMTP server, when SMTP_URL is unset. */
  smtp: EmbeddedSmtpServer | null;
  /** Shutdown steps other parts register (workers, queues); run in reverse by closeContext. */
  onClose(step: () => Promise<void> | void): void;
}

const closeSteps = new WeakMap<AppContext, Array<() => Promise<void> | void>>();

/** Opens the database, registers models, starts mail and builds the auth instance. Does not migrate. */
export async function createContext(config: Config): Promise<AppContext> {
  const sequelize = await openDatabase(config.databaseFile);
  const models = initModels(sequelize);
  const smtp = config.smtpUrl
    ? null
    : await startEmbeddedSmtpServer({ port: config.smtpPort, store: (mail) => storeReceivedMail({ models }, mail) });
  const mailer = createMailer({
    transport: config.smtpUrl ? { url: config.smtpUrl } : { host: smtp!.host, port: smtp!.port },
    from: config.mailFrom,
    onFailure: async (message, error) => {
      await recordAudit({ models }, {
        actorId: null,
        action: "mail.failed",
        entityType: "mail",
        summary: `Mail "${message.subject}" to ${message.to.join(", ")} could not be sent: ${error.message}`,
        data: { to: message.to, subject: message.subject, error: error.message },
      });
    },
  });
  const auth = createAuth({
    config,
    models,
    // Mirrors the failure row (same "auth." family, same client field: the IP only) so the two
    // read side by side; the user is known here, so they are the actor and the entity.
    onSignIn: async ({ userId, email, ipAddress }) => {
      await recordAudit({ models }, {
        actorId: userId,
        actorEmail: email,
        action: "auth.signed-in",
        entityType: "user",
        entityId: userId,
        summary: `${email} signed in.`,
        data: { ipAddress },
      });
    },
    onSignInFailure: async (failure) => {
      await recordAudit({ models }, {
        actorId: null,
        actorEmail: failure.email,
        action: "auth.sign-in-failed",
        entityType: "user",
        entityId: null,
        summary: `Failed sign-in for ${failure.email ?? "an unknown address"} (${failure.reason}).`,
        data: failure,
      });
    },
    onSignInSlowed: async ({ email, ipAddress, waitSeconds }) => {
      await recordAudit({ models }, {
        actorId: null,
        actorEmail: email,
        action: "auth.sign-in-slowed",
        entityType: "user",
        entityId: null,
        summary: `Sign-ins for ${email} paused ${waitSeconds} s after repeated failures.`,
        data: { ipAddress, waitSeconds },
      });
    },
    onPasswordChanged: async (userId) => {
      await sequelize.transaction(async (transaction) => {
        await models.User.update({ mustChangePassword: false }, { where: { id: userId }, transaction });
        await recordAudit({ models }, { actorId: userId, action: "user.password-changed", entityType: "user", entityId: userId, summary: "Password changed." }, transaction);
      });
    },
    onPasswordResetRequested: async (request) => mailPasswordReset({ config, models, mailer, sequelize }, request),
    onPasswordReset: (userId) => recordPasswordReset({ config, models, mailer, sequelize }, userId),
  });
  const steps: Array<() => Promise<void> | void> = [];
  const ctx: AppContext = { config, sequelize, models, auth, mailer, smtp, onClose: (step) => void steps.push(step) };
  closeSteps.set(ctx, steps);
  return ctx;
}

/** Runs registered shutdown steps (newest first), waits for mail in flight, closes SMTP and the database. */
export async function closeContext(ctx: AppContext): Promise<void> {
  const steps = closeSteps.get(ctx) ?? [];
  for (const step of steps.reverse()) await step();
  steps.length = 0;
  await ctx.mailer.idle();
  ctx.mailer.close();
  await ctx.smtp?.close();
  await ctx.sequelize.close();
}
