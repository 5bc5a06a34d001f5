import { useSearchParams } from "react-router-dom";
import { useRunChoices } from "@/features/runs/api/get-runs";
import { useRun } from "@/features/runs/api/get-run";
import { useRunResult } from "@/features/runs/api/get-run-result";
import { runBaseline } from "@/features/runs/lib/compare-baseline";
import { CompareView } from "@/features/runs/components/compare-view";
import { Card, CardBody } from "@/components/ui/card";
import { Cautions } from "@/components/ui/cautions";
import { Field, Select } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";
import { ApprovedSeal, ExploratoryStamp } from "@/components/ui/badges";

/** Pick two finished runs (or the same run twice with two pathways) and compare them on shared axes. */
export default function RunComparePage() {
  const [params, setParams] = useSearchParams();
  const runs = useRunChoices({ status: "succeeded" });
  const a = params.get("a") ?? "";
  const b = params.get("b") ?? "";
  const pa = params.get("pa") ?? "";
  const pb = params.get("pb") ?? "";
  const ra = useRunResult(a || undefined);
  const rb = useRunResult(b || undefined);
  // The manifests carry each run's baseline, which the shared warming axis must name.
  const manifestA = useRun(a || undefined);
  const manifestB = useRun(b || undefined);
  const set = (k: string, v: string) =>
    setParams((prev) => {
      const next = new URLSearchParams(prev);
      if (v) next.set(k, v);
      else next.delete(k);
      if (k === "a") next.delete("pa");
      if (k === "b") next.delete("pb");
      return next;
    });
  const runA = runs.data?.find((r) => r.id === a);
  const runB = runs.data?.find((r) => r.id === b);

  return (
    <>
      <PageHeader kicker="Runs" title="Compare" description="Two runs, or two pathways of one run, side by side on the same warming axis." />
      {runs.isPending ? (
        <LoadingState />
      ) : runs.isError ? (
        <ErrorState error={runs.error} />
      ) : runs.data.length === 0 ? (
        <EmptyState title="No finished runs to compare" />
      ) : (
        <div className="flex flex-col gap-6">
          <Card>
            <CardBody className="grid gap-4 md:grid-cols-2">
              {(
                [
                  ["a", "pa", a, pa, ra.data, runA, "Left"],
                  ["b", "pb", b, pb, rb.data, runB, "Right"],
                ] as const
              ).map(([key, pkey, value, pvalue, result, run, side]) => (
                <div key={key} className="grid gap-2">
                  <Field label={`${side}: run`}>
                    {(p) => (
                      <Select {...p} value={value} onChange={(e) => set(key, e.target.value)}>
                        <option value="">Choose a run…</option>
                        {runs.data.map((r) => (
                          <option key={r.id} value={r.id}>
                            {r.name} — {r.modelVersion.name} v{r.modelVersion.versionNumber}
                            {r.exploratory ? " (exploratory)" : " (approved)"}
                          </option>
                        ))}
                      </Select>
                    )}
                  </Field>
                  {result && (
                    <Field label={`${side}: pathway`}>
                      {(p) => (
                        <Select {...p} value={pvalue || result.pathways[0]?.id} onChange={(e) => set(pkey, e.target.value)}>
                          {result.pathways.map((pw) => (
                            <option key={pw.id} value={pw.id}>
                              {pw.name}
                            </option>
                          ))}
                        </Select>
                      )}
                    </Field>
                  )}
                  {/* Both sides say how they were made, so "two approved versions" reads at a glance. */}
                  {run && (run.exploratory ? <ExploratoryStamp size="sm" /> : <ApprovedSeal size="sm" className="self-start" />)}
                </div>
              ))}
            </CardBody>
          </Card>
          <Cautions />
          {a && b ? (
            ra.isPending || rb.isPending ? (
              <LoadingState label="Loading both results…" />
            ) : ra.isError || rb.isError ? (
              <ErrorState error={ra.error ?? rb.error} />
            ) : (
              <Card>
                <CardBody>
                  <CompareView
                    a={{ label: runA?.name ?? "Left", result: ra.data, pathwayId: pa || ra.data.pathways[0]!.id, baseline: runBaseline(manifestA.data) }}
                    b={{ label: runB?.name ?? "Right", result: rb.data, pathwayId: pb || rb.data.pathways[0]!.id, baseline: runBaseline(manifestB.data) }}
                  />
                </CardBody>
              </Card>
            )
          ) : (
            <EmptyState title="Choose two runs">Pick the same run on both sides to compare two of its pathways.</EmptyState>
          )}
        </div>
      )}
    </>
  );
}
