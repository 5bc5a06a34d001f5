import { fromNodeHeaders } from "better-auth/node";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { deactivateUser, reactivateUser } from "./user-status.service.js";
import { usersInputs as input } from "./users.inputs.js";
import { changeRole, inviteUser, listUsers } from "./users.service.js";

export const usersController = {
  async list(req: Request, res: Response) {
    res.json(await listUsers(contextOf(req)));
  },
  async invite(req: Request, res: Response) {
    res.status(201).json(await inviteUser(contextOf(req), currentUser(req), validated(res, input.invite).body));
  },
  async update(req: Request, res: Response) {
    const { params, body } = validated(res, input.update);
    res.json(await changeRole(contextOf(req), currentUser(req), params.id, body));
  },
  async deactivate(req: Request, res: Response) {
    const { id } = validated(res, input.byId).params;
    res.json(await deactivateUser(contextOf(req), currentUser(req), id, fromNodeHeaders(req.headers)));
  },
  async reactivate(req: Request, res: Response) {
    const { id } = validated(res, input.byId).params;
    res.json(await reactivateUser(contextOf(req), currentUser(req), id, fromNodeHeaders(req.headers)));
  },
};
