// One ESLint configuration for the whole monorepo (flat config). Every package's `lint` script
// runs `eslint .`, which finds this file; `pnpm lint` runs them all through turbo.
//
// Three layers:
//   1. typescript-eslint's strict, type-aware rule sets (the TypeScript program of each file's
//      nearest tsconfig.json answers the type questions), plus react-hooks for the web app;
//   2. the architecture's import boundaries, written as `no-restricted-imports` rules so that a
//      wrong import fails `pnpm lint` (see `lint/import-boundaries.js`; proved by
//      `lint/import-boundaries.test.js`);
//   3. eslint-config-prettier last, so no stylistic rule fights Prettier's formatting.
import js from "@eslint/js";
import tseslint from "typescript-eslint";
import reactHooks from "eslint-plugin-react-hooks";
import prettier from "eslint-config-prettier";
import globals from "globals";
import { importBoundaries } from "./lint/import-boundaries.js";

export default tseslint.config(
  {
    ignores: [
      "**/node_modules/**",
      "**/dist/**",
      "**/coverage/**",
      "**/.turbo/**",
      "**/test-results/**",
      "**/playwright-report/**",
      "e2e/artifacts/**",
      // Generated from member-kernels.wat by scripts/build-kernels.mjs (base64 of the module).
      "packages/engine/src/kernels/member-kernels-wasm.ts",
    ],
  },
  {
    linterOptions: { reportUnusedDisableDirectives: "error" },
  },

  js.configs.recommended,
  ...tseslint.configs.strictTypeChecked,
  {
    languageOptions: {
      parserOptions: {
        // Each file is checked against the tsconfig.json nearest to it.
        projectService: true,
        tsconfigRootDir: import.meta.dirname,
      },
      globals: { ...globals.node },
    },
    rules: {
      // Numbers and booleans in template literals are how the product writes its messages
      // ("${members} members", "v${versionNumber}"); objects and nullish values stay refused.
      "@typescript-eslint/restrict-template-expressions": ["error", { allowNumber: true, allowBoolean: true }],
      // `_name` marks a parameter that a signature requires but the body does not use
      // (Express error handlers take four arguments, for one).
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrors: "all", caughtErrorsIgnorePattern: "^_" },
      ],
      // An arrow shorthand that returns a call's void (`onClick={() => setOpen(false)}`,
      // `.catch((e) => log.error(e))`) is the idiom of React handlers and promise callbacks;
      // the rule still refuses a void value used anywhere it could be mistaken for data.
      "@typescript-eslint/no-confusing-void-expression": ["error", { ignoreArrowShorthand: true }],
      // OFF: `tsconfig` has `noUncheckedIndexedAccess`, so every `array[i]` is `T | undefined`
      // and the compiler already refuses an unchecked read. `!` is the stated, reviewable answer
      // where the index is in range by construction (a loop bound, a length check just above);
      // the engine's hot loops over Float64Arrays hold about 650 of them, and a runtime check
      // there would cost time in the innermost loop for a case that cannot happen.
      "@typescript-eslint/no-non-null-assertion": "off",
      // OFF: the code validates data that arrives typed more optimistically than it is — parsed
      // JSON spec files and API bodies in the engine's validators, JSON columns read back from
      // SQLite, worker-thread messages, uploaded spreadsheets. A guard that the static types call
      // impossible (`kind !== "split-normal"`, `row.notes ?? ""`) is the point there; the rule
      // flagged ~100 such guards and no bug.
      "@typescript-eslint/no-unnecessary-condition": "off",
    },
  },


  // Express routes hand controller methods over unbound (`controller.create`), which the
  // unbound-method rule flags. The real hazard is a controller that reads `this`, so that is
  // what is refused in controllers instead.
  {
    files: ["apps/api/src/**/*.routes.ts"],
    rules: { "@typescript-eslint/unbound-method": "off" },
  },
  {
    files: ["apps/api/src/**/*.controller.ts"],
    rules: {
      "no-restricted-syntax": [
        "error",
        { selector: "ThisExpression", message: "Routes pass controller methods unbound: a controller never reads `this`." },
        // validate() leaves the raw request as it came; the parsed, typed values come from validated().
        {
          selector: "MemberExpression[object.name='req'][property.name=/^(body|query|params)$/]",
          message: "Read the request's checked input with validated(res, input.<endpoint>), not req.body/query/params (those are the raw, unchecked values).",
        },
      ],
    },
  },

  // Sequelize models declare JSON columns with getters typed `this: Model`; Sequelize calls them
  // on the instances it builds (its documented `Model.init` pattern), which this rule cannot see.
  {
    files: ["apps/api/src/**/*.model.ts"],
    rules: { "@typescript-eslint/no-unsafe-class-instance-assignment": "off" },
  },

  // Published coefficient tables (Wichura 1988 AS 241, Cody 1969 for erfc) are written with the
  // digits their source prints, more than a double holds, so each can be checked against the
  // paper; the nearest double is what runs, exactly as with a shorter literal.
  {
    files: ["packages/engine/src/distributions/**/*.ts", "apps/web/src/**/standard-normal.ts"],
    rules: { "no-loss-of-precision": "off" },
  },

  // Tests read HTTP bodies (supertest's `res.body` is `any` by design) and parsed files, then
  // assert on them with `expect`, where a wrong shape fails the test; the no-unsafe-* family
  // would demand a cast before every assertion without adding a check.
  {
    files: ["**/*.test.{ts,tsx}", "**/test-support/**/*.ts", "**/testing/**/*.{ts,tsx}", "e2e/**/*.ts"],
    rules: {
      "@typescript-eslint/no-unsafe-assignment": "off",
      "@typescript-eslint/no-unsafe-member-access": "off",
      "@typescript-eslint/no-unsafe-call": "off",
      "@typescript-eslint/no-unsafe-argument": "off",
      "@typescript-eslint/no-unsafe-return": "off",
    },
  },

  // Plain JavaScript (scripts, bins, this file) and the small vitest configs that no package's
  // tsconfig includes are outside any TypeScript program: no type-aware rules there.
  {
    files: ["**/*.{js,mjs,cjs}", "packages/*/vitest.config.ts", "seeds/vitest.config.ts"],
    ...tseslint.configs.disableTypeChecked,
  },

  // The web app runs in the browser and uses React hooks.
  {
    files: ["apps/web/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    languageOptions: { globals: { ...globals.browser } },
    rules: {
      "react-hooks/rules-of-hooks": "error",
      "react-hooks/exhaustive-deps": "error",
      // React ignores what an event handler returns, so `onClick={async () => …}` is allowed;
      // promises passed anywhere else that expects a void callback are still refused.
      "@typescript-eslint/no-misused-promises": ["error", { checksVoidReturn: { attributes: false } }],
    },
  },

  // Static scripts the browser loads as they are (no build step).
  {
    files: ["apps/web/public/**/*.js"],
    languageOptions: { globals: { ...globals.browser } },
  },

  ...importBoundaries,

  prettier,
);
