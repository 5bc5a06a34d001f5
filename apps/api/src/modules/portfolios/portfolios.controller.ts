import { issueDetails, uploadPortfolioFieldsSchema } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { badRequest } from "../../errors/app-error.js";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { getPortfolio, listPortfolios, uploadPortfolio } from "./portfolios.service.js";

export const portfoliosController = {
  async list(req: Request, res: Response) {
    res.json(await listPortfolios(contextOf(req)));
  },
  async get(req: Request, res: Response) {
    res.json(await getPortfolio(contextOf(req), (req.params as { id: string }).id));
  },
  async upload(req: Request, res: Response) {
    const fields = uploadPortfolioFieldsSchema.safeParse(req.body ?? {});
    if (!fields.success) throw badRequest(issueDetails(fields.error, { fallback: "body" }));
    const out = await uploadPortfolio(contextOf(req), currentUser(req), req.file, fields.data);
    if ("preview" in out) res.json(out.preview);
    else res.status(201).json(out.portfolio);
  },
};
