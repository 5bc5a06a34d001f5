import type { CreateRunBody } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { cancelRun, createRun, getRun, listRuns, replayRun } from "./runs.service.js";

const idOf = (req: Request) => (req.params as { id: string }).id;

export const runsController = {
  async list(req: Request, res: Response) {
    res.json(await listRuns(contextOf(req), currentUser(req), req.query));
  },
  async get(req: Request, res: Response) {
    res.json(await getRun(contextOf(req), idOf(req)));
  },
  async create(req: Request, res: Response) {
    res.status(201).json(await createRun(contextOf(req), currentUser(req), req.body as CreateRunBody));
  },
  async cancel(req: Request, res: Response) {
    res.json(await cancelRun(contextOf(req), currentUser(req), idOf(req)));
  },
  async replay(req: Request, res: Response) {
    res.json(await replayRun(contextOf(req), currentUser(req), idOf(req)));
  },
};
