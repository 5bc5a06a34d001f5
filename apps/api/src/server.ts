import type { Server } from "node:http";
import { demoUsers } from "@plumeline/seeds";
import { createApp } from "./app.js";
import { ConfigError, loadConfig } from "./config.js";
import { closeContext, createContext } from "./context.js";
import { migrate } from "./db/migrate.js";
import { loadDemoSeed } from "./seed/load-demo-seed.js";
import { startWorkers } from "./workers/index.js";

/** Entry point: config, migrations, first-start seed, mail, (workers), listen, graceful shutdown. */
async function main(): Promise<void> {
  const config = loadConfig();
  const ctx = await createContext(config);
  const applied = await migrate(ctx.sequelize);
  if (applied.length > 0) console.log(`[db] applied ${applied.length} migration(s) to ${config.databaseFile}`);
  const seeded = config.seedDemo ? await loadDemoSeed(ctx) : false;
  // Run workers (engine threads) start after migrating; they register their shutdown with ctx.onClose.
  await startWorkers(ctx);

  const app = createApp(ctx);
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(config.port, config.host, () => resolve(s));
    s.once("error", reject);
  });

  const url = config.publicOrigin;
  console.log(`Plumeline is listening on ${url}`);
  console.log(ctx.smtp ? `Mail: embedded SMTP on ${ctx.smtp.host}:${ctx.smtp.port} (read it in the app's outbox)` : "Mail: sent through SMTP_URL");
  if (seeded || config.seedDemo) {
    console.log(seeded ? "Demo data loaded. Demo sign-ins (demo only):" : "Demo sign-ins (if unchanged; demo only):");
    for (const u of demoUsers) console.log(`  ${u.role.padEnd(8)} ${u.email.padEnd(32)} ${u.password}`);
  }

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`[server] ${signal}: shutting down`);
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
  console.error(error instanceof ConfigError ? error.message : error);
  process.exit(1);
});
