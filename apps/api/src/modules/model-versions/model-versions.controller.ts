import type { ChangeClass, CreateModelVersionBody, ListModelVersionsQuery, ModelVersionImpactBody, UpdateModelVersionBody } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { modelVersionImpact } from "./model-version-impact.service.js";
import {
  createModelVersion,
  decideModelVersion,
  diffModelVersion,
  getModelVersion,
  listModelVersions,
  retireModelVersion,
  submitModelVersion,
  updateModelVersion,
} from "./model-versions.service.js";

const idOf = (req: Request) => (req.params as { id: string }).id;

export const modelVersionsController = {
  async list(req: Request, res: Response) {
    res.json(await listModelVersions(contextOf(req), req.query as unknown as ListModelVersionsQuery));
  },
  async get(req: Request, res: Response) {
    res.json(await getModelVersion(contextOf(req), idOf(req)));
  },
  async create(req: Request, res: Response) {
    res.status(201).json(await createModelVersion(contextOf(req), currentUser(req), req.body as CreateModelVersionBody));
  },
  async update(req: Request, res: Response) {
    res.json(await updateModelVersion(contextOf(req), currentUser(req), idOf(req), req.body as UpdateModelVersionBody));
  },
  async diff(req: Request, res: Response) {
    res.json(await diffModelVersion(contextOf(req), idOf(req), (req.query as { against?: string }).against));
  },
  async impact(req: Request, res: Response) {
    res.json(await modelVersionImpact(contextOf(req), idOf(req), req.body as ModelVersionImpactBody));
  },
  async submit(req: Request, res: Response) {
    const body = req.body as { changeClass: ChangeClass; note?: string };
    res.json(await submitModelVersion(contextOf(req), currentUser(req), idOf(req), body.changeClass, body.note));
  },
  async approve(req: Request, res: Response) {
    res.json(await decideModelVersion(contextOf(req), currentUser(req), idOf(req), "approved", (req.body as { comment: string }).comment));
  },
  async reject(req: Request, res: Response) {
    res.json(await decideModelVersion(contextOf(req), currentUser(req), idOf(req), "rejected", (req.body as { comment: string }).comment));
  },
  async retire(req: Request, res: Response) {
    res.json(await retireModelVersion(contextOf(req), currentUser(req), idOf(req), (req.body as { comment?: string }).comment));
  },
};
