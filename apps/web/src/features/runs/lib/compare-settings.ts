import type { Run } from "@plumeline/contracts";
import { runBaseline } from "./compare-baseline";

/** One setting of every compared run, written the same way for each, and whether they differ. */
export interface CompareSetting {
  name: string;
  values: string[];
  differs: boolean;
}

interface ConstraintShape {
  from: number;
  to: number;
  observed: number;
  sd: number;
}

function constraintOf(run: Run): string {
  const c = (run.manifest.spec as { model?: { constraint?: ConstraintShape | null } } | undefined)?.model?.constraint;
  return c ? `observed ${c.observed} ± ${c.sd} K over ${c.from}–${c.to}` : "none";
}

/**
 * The settings that decide a run's numbers, side by side: model version, pathways, members,
 * seed, sampling, observational constraint and baseline. `differs` marks what changed, so a
 * difference in the figures can be traced to its cause.
 */
export function compareSettings(runs: Run[]): CompareSetting[] {
  const rows: Array<[string, (r: Run) => string]> = [
    ["Model version", (r) => `${r.modelVersion.name} v${r.modelVersion.versionNumber}${r.exploratory ? " (exploratory)" : ""}`],
    ["Pathways", (r) => r.manifest.pathways.map((p) => p.name).join(", ") || "–"],
    ["Members", (r) => r.members.toLocaleString("en-GB")],
    ["Seed", (r) => r.seed],
    ["Sampling", (r) => (r.sampling === "latin-hypercube" ? "Latin hypercube" : "Monte Carlo")],
    ["Constraint", constraintOf],
    ["Baseline", (r) => runBaseline(r)!.join("–")],
    ["Engine", (r) => r.manifest.engineVersion ?? "not recorded"],
  ];
  return rows.map(([name, value]) => {
    const values = runs.map(value);
    return { name, values, differs: values.some((v) => v !== values[0]) };
  });
}
