import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { pathwaysInputs as input } from "./pathways.inputs.js";
import { createPathway, getPathway, listPathways, updatePathway, uploadPathway } from "./pathways.service.js";

export const pathwaysController = {
  async list(req: Request, res: Response) {
    res.json(await listPathways(contextOf(req), validated(res, input.list).query));
  },
  async get(req: Request, res: Response) {
    res.json(await getPathway(contextOf(req), validated(res, input.byId).params.id));
  },
  async create(req: Request, res: Response) {
    res.status(201).json(await createPathway(contextOf(req), currentUser(req), validated(res, input.create).body));
  },
  async update(req: Request, res: Response) {
    const { params, body } = validated(res, input.update);
    res.json(await updatePathway(contextOf(req), currentUser(req), params.id, body));
  },
  async upload(req: Request, res: Response) {
    const out = await uploadPathway(contextOf(req), currentUser(req), req.file, validated(res, input.upload).body);
    if ("preview" in out) res.json(out.preview);
    else res.status(201).json(out.pathway);
  },
};
