import type { Request, Response } from "express";
import { contextOf } from "../../middleware/request-context.js";
import { validated } from "../../middleware/validate.js";
import { resultsInputs as input } from "./results.inputs.js";
import { decompressResult } from "./result-document.js";
import { getStoredResult } from "./results.service.js";

export const resultsController = {
  /**
   * The stored gzip document goes out as it is to clients that accept gzip (every browser):
   * no parse, no re-serialise, no re-compress on the server thread. Others get plain JSON.
   */
  async result(req: Request, res: Response) {
    const { document } = await getStoredResult(contextOf(req), validated(res, input.byRun).params.id);
    res.vary("Accept-Encoding");
    if (req.acceptsEncodings("gzip") === "gzip") {
      res.type("application/json").setHeader("Content-Encoding", "gzip");
      res.send(document);
    } else res.json(decompressResult(document));
  },
};
