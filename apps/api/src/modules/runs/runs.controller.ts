import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { getReplay, listReplays, requestReplay } from "./replays.service.js";
import { runsInputs as input } from "./runs.inputs.js";
import { cancelRun, createRun, getRun, listRuns } from "./runs.service.js";

const idOf = (res: Response) => validated(res, input.byId).params.id;

export const runsController = {
  async list(req: Request, res: Response) {
    res.json(await listRuns(contextOf(req), currentUser(req), validated(res, input.list).query));
  },
  async get(req: Request, res: Response) {
    res.json(await getRun(contextOf(req), idOf(res)));
  },
  async create(req: Request, res: Response) {
    res.status(201).json(await createRun(contextOf(req), currentUser(req), validated(res, input.create).body));
  },
  async cancel(req: Request, res: Response) {
    res.json(await cancelRun(contextOf(req), currentUser(req), idOf(res)));
  },
  /** 202: the replay is queued; its progress and verdict are read from GET …/replays/:replayId. */
  async replay(req: Request, res: Response) {
    res.status(202).json(await requestReplay(contextOf(req), currentUser(req), idOf(res)));
  },
  async replays(req: Request, res: Response) {
    res.json(await listReplays(contextOf(req), idOf(res)));
  },
  async replayOne(req: Request, res: Response) {
    const { id, replayId } = validated(res, input.replayOne).params;
    res.json(await getReplay(contextOf(req), id, replayId));
  },
};
