// The architecture's import rules, as ESLint `no-restricted-imports` blocks (flat config).
//
//   web      -> contracts and the engine library; a feature never imports another feature
//               (the app layer, apps/web/src/app, composes them)
//   api      -> engine, contracts, seeds
//   engine   -> nothing of ours, and no Node APIs in the library; its CLI may import contracts,
//               its worker-thread runner (src/node) and benchmark may use Node
//   contracts-> nothing of ours
//   seeds    -> contracts
//
// Each rule matches the import's text, so it needs no module resolver: package names, the web
// app's `@/` alias, and relative paths that climb out of where they may go. In flat config a
// later block's options for the same rule replace an earlier block's, so each block below lists
// every restriction its files need.
import { builtinModules } from "node:module";

/** A relative import that leaves its package for another one of ours (../../apps/api/…). */
const intoAnotherPackage = {
  regex: String.raw`^(\.\./)+(apps|packages|seeds|e2e)(/|$)`,
  message: "Import another workspace package by its @plumeline/* name, and only where the layering allows it.",
};

/** `@plumeline/<name>` for any name not in `allowed`. */
function ourPackagesExcept(allowed, message) {
  const keep = allowed.length ? String.raw`(?!(${allowed.join("|")})(/|$))` : "";
  return { regex: String.raw`^@plumeline/${keep}`, message };
}

const nodeBuiltins = {
  regex: String.raw`^(node:.*|(${builtinModules.filter((m) => !m.startsWith("_")).join("|").replaceAll("/", String.raw`\/`)})(/.*)?)$`,
  message: "The engine library is pure: no Node APIs (I/O, threads, paths). Node code lives in src/node or src/cli.",
};

const featureMessage =
  "A web feature never imports another feature: move the shared part to src/components, src/lib or contracts, or compose the features in src/app.";

/**
 * In apps/web/src/features/<name>/…, a file `depth` folders below its feature's root may climb at
 * most `depth` levels (`../`), which keeps it inside its own feature; its own feature is imported
 * relatively, so `@/features/…` from inside a feature always means another one.
 */
function featureBlock(depth) {
  const inside = "apps/web/src/features/*/" + "*/".repeat(depth);
  const climbOut = String.raw`^(\.\./){${depth + 1},}`;
  return {
    files: [`${inside}*.{ts,tsx}`],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            intoAnotherPackage,
            { regex: String.raw`^@/features(/|$)`, message: featureMessage },
            { regex: climbOut, message: featureMessage },
            ourPackagesExcept(["contracts", "engine"], "The web app imports only @plumeline/contracts and @plumeline/engine."),
            { regex: String.raw`^@plumeline/engine/`, message: "The web app may import only the engine's pure library (@plumeline/engine), not its Node entry points." },
          ],
        },
      ],
      // Dynamic imports are not seen by no-restricted-imports.
      "no-restricted-syntax": [
        "error",
        { selector: String.raw`ImportExpression[source.value=/^@\u002Ffeatures\u002F/]`, message: featureMessage },
        { selector: `ImportExpression[source.value=/^(\\.\\.\\/){${depth + 1},}/]`, message: featureMessage },
      ],
    },
  };
}

export const importBoundaries = [
  // The whole web app (features are narrowed further below).
  {
    files: ["apps/web/**/*.{ts,tsx}"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            intoAnotherPackage,
            ourPackagesExcept(["contracts", "engine"], "The web app imports only @plumeline/contracts and @plumeline/engine."),
            { regex: String.raw`^@plumeline/engine/`, message: "The web app may import only the engine's pure library (@plumeline/engine), not its Node entry points." },
          ],
        },
      ],
    },
  },
  // Feature files sit 0–4 folders below their feature's root (api/, components/charts/, …).
  ...[0, 1, 2, 3, 4].map(featureBlock),

  {
    files: ["apps/api/**/*.{ts,js,mjs}"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            intoAnotherPackage,
            ourPackagesExcept(["engine", "contracts", "seeds"], "The API imports only @plumeline/engine, @plumeline/contracts and @plumeline/seeds."),
          ],
        },
      ],
    },
  },

  {
    files: ["packages/engine/**/*.{ts,js,mjs}"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            intoAnotherPackage,
            ourPackagesExcept([], "The engine library imports nothing of ours (only its CLI may import @plumeline/contracts)."),
            nodeBuiltins,
          ],
        },
      ],
    },
  },
  // The engine's Node side: worker threads and the benchmark may use Node, still nothing of ours.
  {
    files: ["packages/engine/src/node/**", "packages/engine/src/bench/**", "packages/engine/scripts/**", "packages/engine/bin/**", "packages/engine/vitest.config.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [intoAnotherPackage, ourPackagesExcept([], "The engine imports nothing of ours (only its CLI may import @plumeline/contracts).")] },
      ],
    },
  },
  // The CLI validates specs with contracts before handing them to the library.
  {
    files: ["packages/engine/src/cli/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [intoAnotherPackage, ourPackagesExcept(["contracts"], "The engine CLI may import @plumeline/contracts and nothing else of ours.")] },
      ],
    },
  },
  // Tests of the engine library may read fixtures from disk and hold a result up to the
  // contracts' schema (the library itself may do neither).
  {
    files: ["packages/engine/src/**/*.test.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [intoAnotherPackage, ourPackagesExcept(["contracts"], "Engine tests may import @plumeline/contracts and nothing else of ours.")] },
      ],
    },
  },

  {
    files: ["packages/contracts/**/*.{ts,js,mjs}"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [intoAnotherPackage, ourPackagesExcept([], "Contracts import nothing of ours: every other package depends on them.")] },
      ],
    },
  },

  {
    files: ["seeds/**/*.{ts,js,mjs}"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [intoAnotherPackage, ourPackagesExcept(["contracts"], "Seeds import only @plumeline/contracts.")] },
      ],
    },
  },

  {
    // A seed's test may run the seeded data through the engine (a dev dependency of seeds) to
    // check it against published values; the seed data itself still imports only contracts.
    files: ["seeds/**/*.test.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [intoAnotherPackage, ourPackagesExcept(["contracts", "engine"], "Seed tests import only @plumeline/contracts and @plumeline/engine.")] },
      ],
    },
  },
];
