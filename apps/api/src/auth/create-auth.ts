import { betterAuth } from "better-auth";
import { APIError, createAuthMiddleware, isAPIError } from "better-auth/api";
import { admin } from "better-auth/plugins";
import { ACCOUNT_DEACTIVATED_MESSAGE } from "@plumeline/contracts";
import type { Config } from "../config.js";
import type { Models } from "../db/models.js";
import { accessControl, authRoles } from "./access-control.js";
import { createSignInSlowdown } from "./account-sign-in-slowdown.js";
import { sequelizeAdapter } from "./sequelize-adapter.js";

/** Set by app.ts on every /api/auth request from Express's view of the client address. */
export const CLIENT_IP_HEADER = "x-plumeline-client-ip";

export interface SignInFailure {
  email: string | null;
  reason: string;
  ipAddress: string | null;
}

/** A sign-in that opened a session; deliberately nothing of the password or the session token. */
export interface SignInSuccess {
  userId: string;
  email: string;
  ipAddress: string | null;
}

export interface CreateAuthOptions {
  config: Config;
  models: Models;
  onSignIn: (success: SignInSuccess) => Promise<void>;
  onSignInFailure: (failure: SignInFailure) => Promise<void>;
  /** Repeated failures for one address started (or lengthened) its slow-down. */
  onSignInSlowed: (slowed: { email: string; ipAddress: string | null; waitSeconds: number }) => Promise<void>;
  onPasswordChanged: (userId: string) => Promise<void>;
  /** better-auth made a one-time reset token for a known address; mail it (or not: deactivated users get nothing). */
  onPasswordResetRequested: (request: PasswordResetRequest) => Promise<void>;
  /** The token was used and the password replaced; better-auth has already ended the user's sessions. */
  onPasswordReset: (userId: string) => Promise<void>;
}

export interface PasswordResetRequest {
  userId: string;
  email: string;
  name: string;
  banned: boolean;
  /** Invited and has not set a password yet: the mail is worded as the invitation. */
  pendingInvitation: boolean;
  role: string;
  token: string;
}

/** How long a mailed reset link works; better-auth's default (an hour), stated here so the mail can say it. */
export const RESET_TOKEN_SECONDS = 60 * 60;

/**
 * The better-auth instance: email + password only, sign-up disabled (admins invite), sessions
 * stored in SQLite through our Sequelize adapter, roles and deactivation (its ban) through the
 * admin plugin, forgotten passwords through better-auth's own mailed one-time reset token.
 * Mounted by app.ts at /api/auth/*splat.
 */
export function createAuth({ config, models, onSignIn, onSignInFailure, onSignInSlowed, onPasswordChanged, onPasswordResetRequested, onPasswordReset }: CreateAuthOptions) {
  const slowdown = createSignInSlowdown();
  const typedEmail = (body: unknown) => {
    const email = (body as { email?: unknown } | undefined)?.email;
    return typeof email === "string" ? email.toLowerCase().slice(0, 254) : null;
  };
  const secureCookies = config.publicOrigin.startsWith("https://");
  return betterAuth({
    appName: "Plumeline",
    baseURL: config.publicOrigin,
    basePath: "/api/auth",
    secret: config.authSecret,
    trustedOrigins: config.trustedOrigins,
    telemetry: { enabled: false },
    // Sign-ins are audited (failed ones too); better-auth's own warning per bad password is noise in tests.
    logger: { level: config.env === "test" ? "error" : "warn" },
    database: sequelizeAdapter({
      models: { user: models.User, session: models.Session, account: models.Account, verification: models.Verification },
    }),
    user: {
      additionalFields: {
        // Read-only to clients (input: false); set by the invitation, cleared by a password change.
        mustChangePassword: { type: "boolean", required: false, defaultValue: false, input: false },
      },
    },
    emailAndPassword: {
      enabled: true,
      disableSignUp: true,
      minPasswordLength: 10,
      maxPasswordLength: 128,
      resetPasswordTokenExpiresIn: RESET_TOKEN_SECONDS,
      // Whoever knew the old password may hold a session; a reset ends them all.
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user, token }) => {
        const { banned, mustChangePassword, role } = user as { banned?: boolean | null; mustChangePassword?: boolean | null; role?: string | null };
        await onPasswordResetRequested({
          userId: user.id,
          email: user.email,
          name: user.name,
          banned: Boolean(banned),
          pendingInvitation: Boolean(mustChangePassword),
          role: role ?? "analyst",
          token,
        });
      },
      onPasswordReset: async ({ user }) => {
        await onPasswordReset(user.id);
      },
    },
    session: { expiresIn: 60 * 60 * 12, updateAge: 60 * 60 },
    rateLimit: {
      enabled: true,
      window: 60,
      max: 300,
      // Reset requests send mail, so they get the sign-in limit too (no flooding an inbox).
      customRules: {
        "/sign-in/email": { window: 60, max: config.signInRateLimit },
        "/request-password-reset": { window: 60, max: config.signInRateLimit },
      },
    },
    advanced: {
      // better-auth skips its origin/CSRF check under test runners by default; keep it on everywhere.
      disableOriginCheck: false,
      ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
      useSecureCookies: secureCookies,
      defaultCookieAttributes: { httpOnly: true, sameSite: "lax", secure: secureCookies },
    },
    plugins: [
      admin({
        ac: accessControl,
        roles: authRoles,
        defaultRole: "analyst",
        adminRoles: ["admin"],
        // Plumeline calls a ban "deactivation" (users.routes.ts); the sign-in page shows this text.
        bannedUserMessage: ACCOUNT_DEACTIVATED_MESSAGE,
      }),
    ],
    hooks: {
      // A slowed-down address is refused before its password is even checked, with the same
      // answer whether or not an account has it.
      before: createAuthMiddleware((ctx) => {
        if (ctx.path !== "/sign-in/email") return Promise.resolve();
        const email = typedEmail(ctx.body);
        const wait = email ? slowdown.waitSeconds(email) : 0;
        if (wait > 0)
          return Promise.reject(
            new APIError("TOO_MANY_REQUESTS", {
              code: "SIGN_IN_SLOWED",
              message: `Too many failed sign-ins for this address. Try again in ${wait} seconds.`,
            }),
          );
        return Promise.resolve();
      }),
      // Runs after every auth endpoint, also when it failed: `returned` then holds the error.
      after: createAuthMiddleware(async (ctx) => {
        const returned = ctx.context.returned;
        if (ctx.path === "/change-password" && !isAPIError(returned) && ctx.context.session) {
          await onPasswordChanged(ctx.context.session.user.id);
          return;
        }
        if (ctx.path !== "/sign-in/email") return;
        const ipAddress = ctx.request?.headers.get(CLIENT_IP_HEADER) ?? null;
        if (!isAPIError(returned)) {
          // Here rather than in a session-create database hook: only this path is a person
          // signing in (impersonation and password changes also create sessions).
          // `newSession` is what better-auth just set the cookie for.
          const signedIn = ctx.context.newSession;
          if (signedIn) {
            slowdown.recordSuccess(signedIn.user.email);
            await onSignIn({ userId: signedIn.user.id, email: signedIn.user.email, ipAddress });
          }
          return;
        }
        const email = typedEmail(ctx.body);
        await onSignInFailure({
          email,
          reason: returned.body?.code ?? returned.message ?? String(returned.status),
          ipAddress,
        });
        // Wrong credentials count towards the address's slow-down (not a deactivated account's refusal).
        if (email && returned.status === "UNAUTHORIZED" && slowdown.recordFailure(email))
          await onSignInSlowed({ email, ipAddress, waitSeconds: slowdown.waitSeconds(email) });
      }),
    },
  });
}

export type Auth = ReturnType<typeof createAuth>;
