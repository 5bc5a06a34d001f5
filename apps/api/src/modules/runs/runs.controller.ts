import type { CreateRunBody, ListRunsQuery } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { getReplay, listReplays, requestReplay } from "./replays.service.js";
import { cancelRun, createRun, getRun, listRuns } from "./runs.service.js";

const idOf = (req: Request) => (req.params as { id: string }).id;

export const runsController = {
  async list(req: Request, res: Response) {
    res.json(await listRuns(contextOf(req), currentUser(req), req.query as unknown as ListRunsQuery));
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
  /** 202: the replay is queued; its progress and verdict are read from GET …/replays/:replayId. */
  async replay(req: Request, res: Response) {
    res.status(202).json(await requestReplay(contextOf(req), currentUser(req), idOf(req)));
  },
  async replays(req: Request, res: Response) {
    res.json(await listReplays(contextOf(req), idOf(req)));
  },
  async replayOne(req: Request, res: Response) {
    res.json(await getReplay(contextOf(req), idOf(req), (req.params as { replayId: string }).replayId));
  },
};
