import { defineConfig } from "vitest/config";

// Integration tests open real SQLite files and an SMTP server per file. The machine has two
// cores shared with other engineers, so files run one at a time in a single forked worker.
export default defineConfig({
  test: {
    include: ["src/**/*.test.ts"],
    // Migrates and seeds one SQLite file per run; each test file starts from a copy of it.
    globalSetup: ["src/test-support/template-database.ts"],
    environment: "node",
    pool: "forks",
    fileParallelism: false,
    maxWorkers: 1,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
