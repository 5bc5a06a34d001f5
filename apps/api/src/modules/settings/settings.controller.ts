import type { UpdateMaterialityBody } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { getMaterialitySettings, updateMaterialityPolicy } from "./materiality.service.js";

export const settingsController = {
  async getMateriality(req: Request, res: Response) {
    res.json(await getMaterialitySettings(contextOf(req)));
  },
  async updateMateriality(req: Request, res: Response) {
    res.json(await updateMaterialityPolicy(contextOf(req), currentUser(req), req.body as UpdateMaterialityBody));
  },
};
