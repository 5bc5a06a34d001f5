import type { CurveRange, ListPerilProfilesQuery, PerilCurvePreviewBody, PerilProfileBody, UpdatePerilProfileBody } from "@plumeline/contracts";
import { curveRangeSchema } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { perilCurve } from "./peril-curve.js";
import {
  copyPerilProfile,
  createPerilProfile,
  deletePerilProfile,
  getPerilProfile,
  listPerilProfiles,
  perilProfileCurve,
  updatePerilProfile,
} from "./peril-profiles.service.js";

const idOf = (req: Request) => (req.params as { id: string }).id;

export const perilProfilesController = {
  async list(req: Request, res: Response) {
    res.json(await listPerilProfiles(contextOf(req), req.query as unknown as ListPerilProfilesQuery));
  },
  async get(req: Request, res: Response) {
    res.json(await getPerilProfile(contextOf(req), idOf(req)));
  },
  async create(req: Request, res: Response) {
    res.status(201).json(await createPerilProfile(contextOf(req), currentUser(req), req.body as PerilProfileBody, { origin: "the editor" }));
  },
  async update(req: Request, res: Response) {
    res.json(await updatePerilProfile(contextOf(req), currentUser(req), idOf(req), req.body as UpdatePerilProfileBody));
  },
  async remove(req: Request, res: Response) {
    await deletePerilProfile(contextOf(req), currentUser(req), idOf(req));
    res.status(204).end();
  },
  async copy(req: Request, res: Response) {
    res.status(201).json(await copyPerilProfile(contextOf(req), currentUser(req), idOf(req), (req.body as { name?: string } | undefined)?.name));
  },
  async curve(req: Request, res: Response) {
    res.json(await perilProfileCurve(contextOf(req), idOf(req), req.query as unknown as CurveRange));
  },
  preview(req: Request, res: Response) {
    const body = req.body as PerilCurvePreviewBody;
    res.json(perilCurve(body.profile as Parameters<typeof perilCurve>[0], (body.range ?? curveRangeSchema.parse({})) as CurveRange));
  },
};
