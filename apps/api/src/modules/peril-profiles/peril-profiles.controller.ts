import { curveRangeSchema } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { perilCurve } from "./peril-curve.js";
import { perilProfilesInputs as input } from "./peril-profiles.inputs.js";
import {
  copyPerilProfile,
  createPerilProfile,
  deletePerilProfile,
  getPerilProfile,
  listPerilProfiles,
  perilProfileCurve,
  updatePerilProfile,
} from "./peril-profiles.service.js";

export const perilProfilesController = {
  async list(req: Request, res: Response) {
    res.json(await listPerilProfiles(contextOf(req), validated(res, input.list).query));
  },
  async get(req: Request, res: Response) {
    res.json(await getPerilProfile(contextOf(req), validated(res, input.byId).params.id));
  },
  async create(req: Request, res: Response) {
    res
      .status(201)
      .json(await createPerilProfile(contextOf(req), currentUser(req), validated(res, input.create).body, { origin: "the editor" }));
  },
  async update(req: Request, res: Response) {
    const { params, body } = validated(res, input.update);
    res.json(await updatePerilProfile(contextOf(req), currentUser(req), params.id, body));
  },
  async remove(req: Request, res: Response) {
    await deletePerilProfile(contextOf(req), currentUser(req), validated(res, input.byId).params.id);
    res.status(204).end();
  },
  async copy(req: Request, res: Response) {
    const { params, body } = validated(res, input.copy);
    res.status(201).json(await copyPerilProfile(contextOf(req), currentUser(req), params.id, body?.name));
  },
  async curve(req: Request, res: Response) {
    const { params, query } = validated(res, input.curve);
    res.json(await perilProfileCurve(contextOf(req), params.id, query));
  },
  preview(_req: Request, res: Response) {
    const { profile, range } = validated(res, input.preview).body;
    // No range asked for: the same defaults as GET …/:id/curve without a query.
    res.json(perilCurve(profile, range ?? curveRangeSchema.parse({})));
  },
};
