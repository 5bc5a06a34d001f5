import type { InviteUserBody, UpdateUserBody } from "@plumeline/contracts";
import { fromNodeHeaders } from "better-auth/node";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { deactivateUser, reactivateUser } from "./user-status.service.js";
import { changeRole, inviteUser, listUsers } from "./users.service.js";

export const usersController = {
  async list(req: Request, res: Response) {
    res.json(await listUsers(contextOf(req)));
  },
  async invite(req: Request, res: Response) {
    res.status(201).json(await inviteUser(contextOf(req), currentUser(req), req.body as InviteUserBody));
  },
  async update(req: Request, res: Response) {
    const { id } = req.params as { id: string };
    res.json(await changeRole(contextOf(req), currentUser(req), id, req.body as UpdateUserBody));
  },
  async deactivate(req: Request, res: Response) {
    const { id } = req.params as { id: string };
    res.json(await deactivateUser(contextOf(req), currentUser(req), id, fromNodeHeaders(req.headers)));
  },
  async reactivate(req: Request, res: Response) {
    const { id } = req.params as { id: string };
    res.json(await reactivateUser(contextOf(req), currentUser(req), id, fromNodeHeaders(req.headers)));
  },
};
