import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { portfoliosInputs as input } from "./portfolios.inputs.js";
import { getPortfolio, listPortfolios, uploadPortfolio } from "./portfolios.service.js";

export const portfoliosController = {
  async list(req: Request, res: Response) {
    res.json(await listPortfolios(contextOf(req)));
  },
  async get(req: Request, res: Response) {
    res.json(await getPortfolio(contextOf(req), validated(res, input.byId).params.id));
  },
  async upload(req: Request, res: Response) {
    const out = await uploadPortfolio(contextOf(req), currentUser(req), req.file, validated(res, input.upload).body);
    if ("preview" in out) res.json(out.preview);
    else res.status(201).json(out.portfolio);
  },
};
