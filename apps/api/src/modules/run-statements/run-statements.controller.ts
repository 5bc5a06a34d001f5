import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { runStatementsInputs as input } from "./run-statements.inputs.js";
import { listRunStatements, recordRunStatement } from "./run-statements.service.js";

export const runStatementsController = {
  async list(req: Request, res: Response) {
    res.json(await listRunStatements(contextOf(req), validated(res, input.list).params.id));
  },
  async create(req: Request, res: Response) {
    const { params, body } = validated(res, input.create);
    res.status(201).json(await recordRunStatement(contextOf(req), currentUser(req), params.id, body));
  },
};
