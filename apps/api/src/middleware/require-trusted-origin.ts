import type { RequestHandler } from "express";
import { forbidden } from "../errors/app-error.js";
import { contextOf } from "./request-context.js";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** Sec-Fetch-Site values a browser sends for a request the app itself (or the user) made. */
const OWN_FETCH_SITES = new Set(["same-origin", "none"]);

/**
 * Cross-site request forgery guard for cookie-authenticated writes (better-auth applies the
 * same rule to its own endpoints): a state-changing request must come from a trusted Origin.
 * One that carries a cookie but no Origin must at least carry Sec-Fetch-Site: same-origin
 * (every current browser sends one of the two), so a write cannot slip through by having its
 * Origin stripped. Requests with no cookie cannot act for anyone and pass to authentication.
 */
export const requireTrustedOrigin: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) { next(); return; }
  const origin = req.get("origin");
  if (origin !== undefined) {
    if (!contextOf(req).config.trustedOrigins.includes(origin)) {
      throw forbidden(`Requests from ${origin} are not accepted.`, "untrusted_origin");
    }
    next(); return;
  }
  if (!req.get("cookie")) { next(); return; }
  const fetchSite = req.get("sec-fetch-site");
  if (fetchSite === undefined)
    throw forbidden("A signed-in change must say where it comes from: send an Origin (or Sec-Fetch-Site) header.", "origin_required");
  if (!OWN_FETCH_SITES.has(fetchSite)) throw forbidden(`Requests from another site (${fetchSite}) are not accepted.`, "untrusted_origin");
  next();
};
