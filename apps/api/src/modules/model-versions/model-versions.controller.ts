import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { modelVersionImpact } from "./model-version-impact.service.js";
import { modelVersionsInputs as input } from "./model-versions.inputs.js";
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

export const modelVersionsController = {
  async list(req: Request, res: Response) {
    res.json(await listModelVersions(contextOf(req), currentUser(req), validated(res, input.list).query));
  },
  async get(req: Request, res: Response) {
    res.json(await getModelVersion(contextOf(req), validated(res, input.byId).params.id));
  },
  async create(req: Request, res: Response) {
    res.status(201).json(await createModelVersion(contextOf(req), currentUser(req), validated(res, input.create).body));
  },
  async update(req: Request, res: Response) {
    const { params, body } = validated(res, input.update);
    res.json(await updateModelVersion(contextOf(req), currentUser(req), params.id, body));
  },
  async diff(req: Request, res: Response) {
    const { params, query } = validated(res, input.diff);
    res.json(await diffModelVersion(contextOf(req), params.id, query.against));
  },
  async impact(req: Request, res: Response) {
    const { params, body } = validated(res, input.impact);
    res.json(await modelVersionImpact(contextOf(req), params.id, body));
  },
  async submit(req: Request, res: Response) {
    const { params, body } = validated(res, input.submit);
    res.json(await submitModelVersion(contextOf(req), currentUser(req), params.id, body.changeClass, body.note));
  },
  async approve(req: Request, res: Response) {
    const { params, body } = validated(res, input.decide);
    res.json(await decideModelVersion(contextOf(req), currentUser(req), params.id, "approved", body.comment));
  },
  async reject(req: Request, res: Response) {
    const { params, body } = validated(res, input.decide);
    res.json(await decideModelVersion(contextOf(req), currentUser(req), params.id, "rejected", body.comment));
  },
  async retire(req: Request, res: Response) {
    const { params, body } = validated(res, input.retire);
    res.json(await retireModelVersion(contextOf(req), currentUser(req), params.id, body.comment));
  },
};
