import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";
import { sharedResolve } from "./vite.config";

export default defineConfig({
  plugins: [react()],
  resolve: sharedResolve,
  test: {
    environment: "jsdom",
    include: ["src/**/*.test.{ts,tsx}"],
    setupFiles: ["./src/testing/setup-tests.ts"],
    css: false,
  },
});
