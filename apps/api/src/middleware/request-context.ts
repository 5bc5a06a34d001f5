import type { Request } from "express";
import type { Role } from "@plumeline/contracts";
import type { AppContext } from "../context.js";
import { unauthorized } from "../errors/app-error.js";

/** The signed-in user as routes see it (set by `authenticate`). */
export interface RequestUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  /** True for an invited user still on the mailed password. */
  mustChangePassword: boolean;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      user?: RequestUser;
    }
  }
}

/** The AppContext createApp stored on the app; controllers use it to call services. */
export function contextOf(req: Request): AppContext {
  return req.app.locals.ctx as AppContext;
}

/** The signed-in user; only valid behind `authenticate` (throws 401 otherwise). */
export function currentUser(req: Request): RequestUser {
  if (!req.user) throw unauthorized();
  return req.user;
}
