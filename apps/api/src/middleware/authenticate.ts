import type { RequestHandler } from "express";
import { fromNodeHeaders } from "better-auth/node";
import { isRole } from "../auth/permissions.js";
import { forbidden, unauthorized } from "../errors/app-error.js";
import { contextOf } from "./request-context.js";

/** Resolves the better-auth session cookie to `req.user`, or answers 401. */
export const authenticate: RequestHandler = async (req, _res, next) => {
  const session = await contextOf(req).auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
  if (!session) throw unauthorized();
  const { id, email, name, role } = session.user as { id: string; email: string; name: string; role?: string | null };
  if (!isRole(role)) throw forbidden(`Your account has no Plumeline role (found "${role ?? ""}"). Ask an admin to set one.`, "no_role");
  req.user = { id, email, name, role };
  next();
};
