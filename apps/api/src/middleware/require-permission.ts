import type { RequestHandler } from "express";
import { hasPermission, type Permission } from "@plumeline/contracts";
import { forbidden } from "../errors/app-error.js";
import { currentUser } from "./request-context.js";

/** Lets the request through only if the signed-in user's role grants `permission` (403 names it). */
export function requirePermission(permission: Permission): RequestHandler {
  return (req, _res, next) => {
    const user = currentUser(req);
    if (!hasPermission(user.role, permission)) {
      throw forbidden(`The ${user.role} role lacks the permission ${permission}.`, "missing_permission");
    }
    next();
  };
}
