import type { Request, Response } from "express";
import type { Me } from "@plumeline/contracts";
import { permissionsOf } from "@plumeline/contracts";
import { currentUser } from "../../middleware/request-context.js";

export const meController = {
  show(req: Request, res: Response) {
    const { id, email, name, role, mustChangePassword } = currentUser(req);
    const body: Me = { user: { id, email, name, role }, permissions: permissionsOf(role), mustChangePassword };
    res.json(body);
  },
};
