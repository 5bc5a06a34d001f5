import type { RequestHandler } from "express";
import { fromNodeHeaders } from "better-auth/node";
import { isRole } from "@plumeline/contracts";
import { forbidden, unauthorized } from "../errors/app-error.js";
import { contextOf } from "./request-context.js";

function resolveUser(options: { allowPendingPasswordChange: boolean }): RequestHandler {
  return async (req, _res, next) => {
    const session = await contextOf(req).auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
    if (!session) throw unauthorized();
    const { id, email, name, role, mustChangePassword } = session.user as {
      id: string;
      email: string;
      name: string;
      role?: string | null;
      mustChangePassword?: boolean | null;
    };
    if (!isRole(role)) throw forbidden(`Your account has no Plumeline role (found "${role ?? ""}"). Ask an admin to set one.`, "no_role");
    if (mustChangePassword && !options.allowPendingPasswordChange) {
      throw forbidden("Choose your own password first: the mailed one works only once.", "password_change_required");
    }
    req.user = { id, email, name, role, mustChangePassword: Boolean(mustChangePassword) };
    next();
  };
}

/** Resolves the better-auth session cookie to `req.user`, or answers 401. */
export const authenticate: RequestHandler = resolveUser({ allowPendingPasswordChange: false });

/** Like `authenticate`, but also lets through an invited user who has not yet replaced the mailed password (GET /api/me only). */
export const authenticateAllowingPasswordChange: RequestHandler = resolveUser({ allowPendingPasswordChange: true });
