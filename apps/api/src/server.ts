import type { Server } from "node:http";
import { demoUsers } from "@plumeline/seeds";
import { createApp } from "./app.js";
import { ConfigError, loadConfig } from "./config.js";
import { closeContext, createContext } from "./context.js";
import { migrate } from "./db/migrate.js";
import { logger } from "./logging/logger.js";
import { loadDemoSeed } from "./seed/load-demo-seed.js";
import { startWorkers } from "./workers/index.js";

/** Entry point: config, migrations, first-start seed, mail, (workers), listen, graceful shutdown. */
async function main(): Promise<void> {
  const config = loadConfig();
  const ctx = await createContext(config);
  const applied = await migrate(ctx.sequelize);
  if (applied.length > 0) logger.info({ migrations: applied.length, databaseFile: config.databaseFile }, "database migrated");
  const seeded = config.seedDemo ? await loadDemoSeed(ctx) : false;
  // Run workers (engine threads) start after migrating; they register their shutdown with ctx.onClose.
  await startWorkers(ctx);

  const app = createApp(ctx);
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(config.port, config.host, () => resolve(s));
    s.once("error", reject);
  });

  const url = config.publicOrigin;
  logger.info({ url }, `Plumeline is listening on ${url}`);
  logger.info(
    ctx.smtp ? { smtp: `${ctx.smtp.host}:${ctx.smtp.port}` } : {},
    ctx.smtp ? "mail goes to the embedded SMTP server (read it in the app's outbox)" : "mail is sent through SMTP_URL",
  );
  if (seeded || config.seedDemo) {
    // Addresses only: the log never carries a password, not even a demo one (README lists them).
    const signIns = demoUsers.map(({ role, email }) => ({ role, email }));
    logger.info({ signIns }, seeded ? "demo data loaded; demo sign-ins (passwords in README, demo only)" : "demo sign-ins if unchanged (passwords in README, demo only)");
  }

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, "shutting down");
    const forced = setTimeout(() => process.exit(1), 10_000);
    forced.unref();
    // Stop accepting, let requests in flight finish, drop idle keep-alive sockets.
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeIdleConnections();
    await closed;
    await closeContext(ctx);
    clearTimeout(forced);
    process.exit(0);
  };
  process.on("SIGINT", () => void stop("SIGINT"));
  process.on("SIGTERM", () => void stop("SIGTERM"));
}

main().catch((error: unknown) => {
  if (error instanceof ConfigError) logger.fatal(error.message);
  else logger.fatal({ err: error }, "could not start");
  process.exit(1);
});
