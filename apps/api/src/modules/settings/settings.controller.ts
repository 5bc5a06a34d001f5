import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { getMaterialitySettings, updateMaterialityPolicy } from "./materiality.service.js";
import { settingsInputs as input } from "./settings.inputs.js";

export const settingsController = {
  async getMateriality(req: Request, res: Response) {
    res.json(await getMaterialitySettings(contextOf(req)));
  },
  async updateMateriality(req: Request, res: Response) {
    res.json(await updateMaterialityPolicy(contextOf(req), currentUser(req), validated(res, input.updateMateriality).body));
  },
};
