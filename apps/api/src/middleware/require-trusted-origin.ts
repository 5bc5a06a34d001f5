import type { RequestHandler } from "express";
import { forbidden } from "../errors/app-error.js";
import { contextOf } from "./request-context.js";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Cross-site request forgery guard for cookie-authenticated writes: a state-changing request
 * that carries an Origin header must come from a trusted origin (better-auth applies the same
 * rule to its own endpoints). Requests without Origin (scripts, curl) are not browser-forged.
 */
export const requireTrustedOrigin: RequestHandler = (req, _res, next) => {
  const origin = req.get("origin");
  if (SAFE_METHODS.has(req.method) || origin === undefined) { next(); return; }
  if (!contextOf(req).config.trustedOrigins.includes(origin)) {
    throw forbidden(`Requests from ${origin} are not accepted.`, "untrusted_origin");
  }
  next();
};
