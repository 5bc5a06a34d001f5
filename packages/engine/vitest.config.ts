import { defineConfig } from "vitest/config";

// Ensemble tests run real engine runs of thousands of members. Speed is measured by the
// benchmarks, not by unit-test timings, so a busy shared machine must not fail a test on
// vitest's 5 s default.
export default defineConfig({
  test: { include: ["src/**/*.test.ts"], testTimeout: 120_000 },
});
