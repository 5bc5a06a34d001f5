import { toNodeHandler } from "better-auth/node";
import compression from "compression";
import express from "express";
import { rateLimit } from "express-rate-limit";
import helmet from "helmet";
import type { AppContext } from "./context.js";
import { CLIENT_IP_HEADER } from "./auth/create-auth.js";
import { AppError } from "./errors/app-error.js";
import { errorHandler } from "./errors/error-handler.js";
import { serveWebBuild } from "./http/serve-web-build.js";
import { noStore } from "./middleware/no-store.js";
import { rejectControlCharacters } from "./middleware/reject-control-characters.js";
import { requireTrustedOrigin } from "./middleware/require-trusted-origin.js";
import { moduleRouters } from "./modules/index.js";

const JSON_LIMIT = "1mb";
const PERMISSIONS_POLICY = "accelerometer=(), camera=(), geolocation=(), gyroscope=(), magnetometer=(), microphone=(), payment=(), usb=(), interest-cohort=()";

/** Builds the Express app around a context without listening, so tests drive it in-process. */
export function createApp(ctx: AppContext): express.Express {
  const app = express();
  app.locals.ctx = ctx;
  app.disable("x-powered-by");
  app.set("trust proxy", "loopback");
  app.use(helmet());
  // helmet does not set this one: the app uses no camera, microphone, location, payment or USB.
  app.use((_req, res, next) => {
    res.setHeader("Permissions-Policy", PERMISSIONS_POLICY);
    next();
  });
  // gzip/deflate (or brotli, when the client asks for it) for JSON and the web build's text
  // assets; responses that already carry a Content-Encoding (a stored gzip result) pass through.
  app.use(compression());
  app.use("/api", noStore);

  // Sign-in attempts per client address; on top of better-auth's own limiter.
  app.use(
    "/api/auth/sign-in",
    rateLimit({
      windowMs: 60_000,
      limit: ctx.config.signInRateLimit,
      standardHeaders: "draft-7",
      legacyHeaders: false,
      handler: (_req, res) => {
        res.status(429).json({ error: { code: "rate_limited", message: "Too many sign-in attempts. Wait a minute and try again." } });
      },
    }),
  );
  // User management goes through /api/users (validated, audited, no self-demotion). The admin
  // plugin's HTTP endpoints would bypass all three, so only server-side calls may use them.
  app.all("/api/auth/admin/*splat", (req, _res, next) =>
    next(new AppError(404, "not_found", `No API endpoint ${req.method} ${req.originalUrl}; manage users through /api/users.`)),
  );
  // better-auth reads the raw body itself, so it is mounted before express.json(). It sees
  // a fetch Request without the socket, so it gets the client address (as Express resolved
  // it under "trust proxy") in a header we always overwrite, so a client cannot spoof it.
  app.all("/api/auth/*splat", (req, _res, next) => {
    req.headers[CLIENT_IP_HEADER] = req.ip ?? req.socket.remoteAddress ?? "unknown";
    next();
  }, toNodeHandler(ctx.auth));

  app.use(express.json({ limit: JSON_LIMIT }));
  const api = express.Router();
  api.use(requireTrustedOrigin);
  api.use(rejectControlCharacters);
  for (const [mountPath, router] of moduleRouters) api.use(mountPath, router);
  api.use((req, _res, next) => next(new AppError(404, "not_found", `No API endpoint ${req.method} ${req.baseUrl}${req.path}.`)));
  app.use("/api", api);

  serveWebBuild(app, ctx.config.webDist);
  app.use(errorHandler);
  return app;
}
