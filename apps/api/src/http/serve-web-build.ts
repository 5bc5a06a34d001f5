import { existsSync } from "node:fs";
import path from "node:path";
import type express from "express";
import { static as serveStatic } from "express";

/**
 * Serves the built web app with an SPA fallback: any non-/api GET gets index.html.
 * Cache lifetimes follow how each file is named: hashed assets never change under their
 * name, so browsers keep them a year without asking again (`immutable`); index.html names the
 * current hashes, so it is always revalidated (`no-cache`); other files (favicon, fonts
 * copied from public/) keep a short lifetime.
 */
export function serveWebBuild(app: express.Express, webDist: string): void {
  const indexHtml = path.join(webDist, "index.html");
  if (!existsSync(indexHtml)) return;
  // Vite names every file under assets/ by a hash of its content: a changed file gets a new name.
  const hashedAssets = path.join(webDist, "assets") + path.sep;
  app.use(
    serveStatic(webDist, {
      index: false,
      setHeaders(res, filePath) {
        if (filePath.startsWith(hashedAssets))
          res.setHeader("Cache-Control", "public, max-age=31536000, immutable");
        else if (filePath === indexHtml) res.setHeader("Cache-Control", "no-cache");
        else res.setHeader("Cache-Control", "public, max-age=3600");
      },
    }),
  );
  app.get(/^(?!\/api(?:\/|$)).*/, (_req, res) => {
    res.setHeader("Cache-Control", "no-cache");
    res.sendFile(indexHtml);
  });
}
