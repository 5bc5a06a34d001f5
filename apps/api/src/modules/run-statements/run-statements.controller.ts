import type { CreateRunStatementBody } from "@plumeline/contracts";
import type { Request, Response } from "express";
import { contextOf, currentUser } from "../../middleware/request-context.js";
import { listRunStatements, recordRunStatement } from "./run-statements.service.js";

const idOf = (req: Request) => (req.params as { id: string }).id;

export const runStatementsController = {
  async list(req: Request, res: Response) {
    res.json(await listRunStatements(contextOf(req), idOf(req)));
  },
  async create(req: Request, res: Response) {
    res.status(201).json(await recordRunStatement(contextOf(req), currentUser(req), idOf(req), req.body as CreateRunStatementBody));
  },
};
