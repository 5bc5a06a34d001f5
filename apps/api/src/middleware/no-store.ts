import type { NextFunction, Request, Response } from "express";

/**
 * API answers are per person and change with every write (runs move, reviews decide), so no
 * browser or proxy may keep a copy: `Cache-Control: no-store` on everything under /api.
 */
export function noStore(_req: Request, res: Response, next: NextFunction): void {
  res.setHeader("Cache-Control", "no-store");
  next();
}
