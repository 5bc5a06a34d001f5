import { randomBytes } from "node:crypto";
import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { demoUsers } from "@plumeline/seeds";
import type { TestProject } from "vitest/node";
import { loadConfig } from "../config.js";
import { closeContext, createContext } from "../context.js";
import { migrate } from "../db/migrate.js";
import { seedUsers } from "../seed/seed-users.js";

declare module "vitest" {
  export interface ProvidedContext {
    /** A SQLite file already migrated and holding one user per role; each test context copies it. */
    templateDatabase: string;
  }
}

/**
 * Vitest global setup: builds the test database once per run — every migration, then the
 * demo users, whose passwords better-auth hashes with its (deliberately slow) scrypt — so a
 * test file copies one finished file instead of repeating that work (about 3 s a file on a
 * busy two-core machine). The copy is still a file of its own in its own temp folder, and
 * `createTestContext` runs `migrate` and `seedUsers` on it too (both no-ops on a finished file).
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const dir = await mkdtemp(path.join(os.tmpdir(), "plumeline-template-"));
  const config = loadConfig({
    NODE_ENV: "test",
    PLUMELINE_DATA_DIR: dir,
    AUTH_SECRET: randomBytes(32).toString("base64url"),
    SMTP_PORT: "0",
    WORKERS: "1",
    WEB_DIST: path.join(dir, "no-web-build"),
  });
  const ctx = await createContext(config);
  try {
    await migrate(ctx.sequelize);
    await seedUsers(ctx, demoUsers);
    // One self-contained file: fold the write-ahead log in before closing, so copying the main file is enough.
    await ctx.sequelize.query("PRAGMA wal_checkpoint(TRUNCATE)");
  } finally {
    await closeContext(ctx);
  }
  project.provide("templateDatabase", config.databaseFile);
  return async () => {
    await rm(dir, { recursive: true, force: true });
  };
}
