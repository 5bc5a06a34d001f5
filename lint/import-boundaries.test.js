// Proves the import-boundary rules still bite: each case lints a one-line import as if it were
// the text of a real file of the repository (ESLint's Node API, the repository's own config)
// and checks whether `no-restricted-imports` reports it. Run by `pnpm lint`.
import assert from "node:assert/strict";
import path from "node:path";
import { describe, it } from "node:test";
import { ESLint } from "eslint";

const root = path.resolve(import.meta.dirname, "..");
const eslint = new ESLint({ cwd: root });

/** The boundary messages ESLint reports for `source` placed at `file` (relative to the root). */
async function boundaryErrors(file, source) {
  const [result] = await eslint.lintText(source, { filePath: path.join(root, file) });
  return result.messages.filter((m) => m.ruleId === "no-restricted-imports" || m.ruleId === "no-restricted-syntax").map((m) => m.message);
}

const refused = async (file, source, why) => {
  const errors = await boundaryErrors(file, source);
  assert.ok(errors.length > 0, `expected a boundary error for ${file}: ${source}`);
  assert.match(errors.join("\n"), why);
};
const allowed = async (file, source) => assert.deepEqual(await boundaryErrors(file, source), []);

// Real files whose text the linter is asked to imagine replaced; any file in the folder would do.
const runsFeatureFile = "apps/web/src/features/runs/api/get-run.ts";
const appPage = "apps/web/src/app/routes/run-page.tsx";
const engineLibraryFile = "packages/engine/src/distributions/normal.ts";
const engineCliFile = "packages/engine/src/cli/main.ts";
const apiFile = "apps/api/src/app.ts";
const contractsFile = "packages/contracts/src/index.ts";

describe("web: a feature never imports another feature", () => {
  it("refuses another feature through the @/ alias", () =>
    refused(runsFeatureFile, 'export { usePerilProfiles } from "@/features/peril/api/get-peril-profiles";\n', /never imports another feature/));
  it("refuses another feature through a relative path", () =>
    refused(runsFeatureFile, 'export { usePerilProfiles } from "../../peril/api/get-peril-profiles";\n', /never imports another feature/));
  it("refuses another feature through a dynamic import", () =>
    refused(runsFeatureFile, 'export const load = () => import("@/features/peril/api/get-peril-profiles");\n', /never imports another feature/));
  it("allows the feature's own files and the shared layers", () =>
    allowed(runsFeatureFile, 'export { useRun } from "./get-run-result";\nexport { paths } from "@/config/paths";\n'));
  it("allows the app layer to compose features", () =>
    allowed(appPage, 'export { useRun } from "@/features/runs/api/get-run";\nexport { useMe } from "@/features/auth/api/get-me";\n'));
  it("refuses the API and the seeds", () => refused(runsFeatureFile, 'export { demoUsers } from "@plumeline/seeds";\n', /only @plumeline\/contracts/));
});

describe("engine: the library imports nothing of ours", () => {
  it("refuses the API by package name", () => refused(engineLibraryFile, 'export { createApp } from "@plumeline/api";\n', /imports nothing of ours/));
  it("refuses the API by relative path", () =>
    refused(engineLibraryFile, 'export { createApp } from "../../../../apps/api/src/app.js";\n', /by its @plumeline\/\* name/));
  it("refuses contracts in the library", () => refused(engineLibraryFile, 'export { runSpecSchema } from "@plumeline/contracts";\n', /imports nothing of ours/));
  it("refuses Node APIs in the library", () => refused(engineLibraryFile, 'export { readFileSync } from "node:fs";\n', /no Node APIs/));
  it("allows contracts in the CLI", () => allowed(engineCliFile, 'export { runSpecSchema } from "@plumeline/contracts";\n'));
});

describe("api: imports only engine, contracts and seeds", () => {
  it("allows engine, contracts and seeds", () =>
    allowed(apiFile, 'export { runEnsemble } from "@plumeline/engine";\nexport { runSpecSchema } from "@plumeline/contracts";\nexport { demoUsers } from "@plumeline/seeds";\n'));
  it("refuses the web app", () => refused(apiFile, 'export { routes } from "@plumeline/web";\n', /only @plumeline\/engine, @plumeline\/contracts and @plumeline\/seeds/));
});

describe("contracts import nothing of ours", () => {
  it("refuses the engine", () => refused(contractsFile, 'export { runEnsemble } from "@plumeline/engine";\n', /Contracts import nothing of ours/));
});
