import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import { fileURLToPath } from "node:url";

/**
 * Dev server proxies /api to the API (default port 4000; PLUMELINE_API_URL points it elsewhere,
 * e.g. a private instance on 4103). The Origin header is rewritten so better-auth's trusted-origin
 * check sees the API's own origin during development.
 */
const apiTarget = process.env.PLUMELINE_API_URL ?? "http://localhost:4000";

export const sharedResolve = {
  alias: {
    "@": fileURLToPath(new URL("./src", import.meta.url)),
    // Read the contracts and the engine's pure library from source so the web app never depends
    // on a stale dist build (the engine library has no Node APIs; its ./node entry is not for here).
    "@plumeline/contracts": fileURLToPath(new URL("../../packages/contracts/src/index.ts", import.meta.url)),
    "@plumeline/engine": fileURLToPath(new URL("../../packages/engine/src/index.ts", import.meta.url)),
  },
};

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: sharedResolve,
  server: {
    port: 5173,
    proxy: {
      "/api": {
        target: apiTarget,
        changeOrigin: true,
        configure: (proxy) => {
          proxy.on("proxyReq", (req) => req.setHeader("origin", apiTarget));
        },
      },
    },
  },
  build: {
    target: "es2022",
    // Vite 8 still honours rollupOptions/manualChunks (deprecated for rolldown's codeSplitting);
    // moving is its own change, checked against the bundle sizes.
    // eslint-disable-next-line @typescript-eslint/no-deprecated -- see above
    rollupOptions: {
      output: {
        // Keep the framework and d3 in their own long-lived chunks; routes are lazy-loaded.
        // eslint-disable-next-line @typescript-eslint/no-deprecated -- see above
        manualChunks(id: string) {
          if (!id.includes("node_modules")) return undefined;
          if (/[\\/]node_modules[\\/](d3|d3-[^\\/]+|internmap|delaunator|robust-predicates)[\\/]/.test(id)) return "d3";
          if (/[\\/]node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom|@tanstack)[\\/]/.test(id))
            return "framework";
          if (/[\\/]node_modules[\\/](zod)[\\/]/.test(id)) return "zod";
          return undefined;
        },
      },
    },
  },
});
