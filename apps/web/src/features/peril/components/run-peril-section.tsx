import type { PortfolioRow, Run, RunResult } from "@plumeline/contracts";
import { PerilResults } from "./peril-results";

/**
 * The peril lens section of a run's result page, or nothing when the run carried no peril
 * profiles. Reads the pathway names from the result and today's portfolio figures from the
 * run's stored spec (the rows were copied into it when the run was made).
 */
export function RunPerilSection({ run, result }: { run: Pick<Run, "manifest">; result: Pick<RunResult, "perils" | "pathways"> }) {
  if (!result.perils) return null;
  const spec = (run.manifest.spec ?? {}) as { portfolio?: { rows?: PortfolioRow[] } };
  return (
    <div className="mt-6">
      <PerilResults
        result={result.perils}
        pathwayNames={Object.fromEntries(result.pathways.map((p) => [p.id, p.name]))}
        baselineRows={spec.portfolio?.rows ?? []}
      />
    </div>
  );
}
