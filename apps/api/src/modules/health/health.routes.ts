import { Router } from "express";
import { engineVersion } from "./engine-version.js";

/** GET /api/health — no sign-in; used by load balancers and the e2e start-up wait. */
export const healthRouter = Router();

healthRouter.get("/", async (_req, res) => {
  res.json({ ok: true, engineVersion: await engineVersion() });
});
