import type { Request, Response } from "express";
import type { Me } from "@plumeline/contracts";
import { permissionsOf } from "../../auth/permissions.js";
import { currentUser } from "../../middleware/request-context.js";

export const meController = {
  show(req: Request, res: Response) {
    const user = currentUser(req);
    const body: Me = { user, permissions: permissionsOf(user.role) };
    res.json(body);
  },
};
