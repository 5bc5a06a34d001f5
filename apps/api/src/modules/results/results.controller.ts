import type { Request, Response } from "express";
import { contextOf } from "../../middleware/request-context.js";
import { getRunWithResult } from "./results.service.js";

export const resultsController = {
  async result(req: Request, res: Response) {
    const { result } = await getRunWithResult(contextOf(req), (req.params as { id: string }).id);
    res.json(result);
  },
};
