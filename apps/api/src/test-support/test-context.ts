import { randomBytes } from "node:crypto";
import { copyFile, mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { demoUsers, type DemoUser } from "@plumeline/seeds";
import type { Express } from "express";
import { inject } from "vitest";
import { createApp } from "../app.js";
import { loadConfig } from "../config.js";
import { closeContext, createContext, type AppContext } from "../context.js";
import { migrate } from "../db/migrate.js";
import { seedUsers, type SeededUserIds } from "../seed/seed-users.js";

export const TEST_ORIGIN = "http://localhost:4101";

export interface TestContext {
  ctx: AppContext;
  app: Express;
  /** Seed user key -> id: analyst, actuary, manager, manager2, admin. */
  userIds: SeededUserIds;
  dataDir: string;
  close(): Promise<void>;
}

/**
 * A real app on a fresh SQLite file in a temp folder: migrated, embedded SMTP on a random
 * port, and one user per role (the demo users from @plumeline/seeds, known passwords).
 * Call `close()` in afterAll. One open test context per test file at a time.
 */
export async function createTestContext(env: Record<string, string> = {}): Promise<TestContext> {
  const dataDir = await mkdtemp(path.join(os.tmpdir(), "plumeline-test-"));
  const config = loadConfig({
    NODE_ENV: "test",
    PLUMELINE_DATA_DIR: dataDir,
    AUTH_SECRET: randomBytes(32).toString("base64url"),
    PUBLIC_ORIGIN: TEST_ORIGIN,
    SMTP_PORT: "0",
    SIGN_IN_RATE_LIMIT: "1000",
    WORKERS: "1",
    WEB_DIST: path.join(dataDir, "no-web-build"),
    ...env,
  });
  // The run's template (test-support/template-database.ts) is already migrated and seeded;
  // starting from a copy saves every file the migrations and the slow password hashing.
  const template = inject("templateDatabase");
  if (template) await copyFile(template, config.databaseFile);
  const ctx = await createContext(config);
  await migrate(ctx.sequelize);
  const userIds = await seedUsers(ctx, demoUsers);
  const app = createApp(ctx);
  return {
    ctx,
    app,
    userIds,
    dataDir,
    async close() {
      await closeContext(ctx);
      await rm(dataDir, { recursive: true, force: true });
    },
  };
}

export function demoUser(key: DemoUser["key"]): DemoUser {
  const user = demoUsers.find((u) => u.key === key);
  if (!user) throw new Error(`No demo user with key ${key}`);
  return user;
}
