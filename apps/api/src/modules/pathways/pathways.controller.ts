import { issueDetails, uploadPathwayFieldsSchema, type CreatePathwayBody, type ListPathwaysQuery, type UpdatePathwayBody } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { badRequest } from "../../errors/app-error.js";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { createPathway, getPathway, listPathways, updatePathway, uploadPathway } from "./pathways.service.js";

export const pathwaysController = {
  async list(req: Request, res: Response) {
    res.json(await listPathways(contextOf(req), req.query as unknown as ListPathwaysQuery));
  },
  async get(req: Request, res: Response) {
    res.json(await getPathway(contextOf(req), (req.params as { id: string }).id));
  },
  async create(req: Request, res: Response) {
    res.status(201).json(await createPathway(contextOf(req), currentUser(req), req.body as CreatePathwayBody));
  },
  async update(req: Request, res: Response) {
    res.json(await updatePathway(contextOf(req), currentUser(req), (req.params as { id: string }).id, req.body as UpdatePathwayBody));
  },
  async upload(req: Request, res: Response) {
    const fields = uploadPathwayFieldsSchema.safeParse(req.body ?? {});
    if (!fields.success) throw badRequest(issueDetails(fields.error, { fallback: "body" }));
    const out = await uploadPathway(contextOf(req), currentUser(req), req.file, fields.data);
    if ("preview" in out) res.json(out.preview);
    else res.status(201).json(out.pathway);
  },
};
