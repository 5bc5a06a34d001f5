import type { Run, RunResult, RunSummary } from "@plumeline/contracts";
import { runPickerSource, useRuns } from "@/features/runs/api/get-runs";
import { useRun } from "@/features/runs/api/get-run";
import { useRunResult } from "@/features/runs/api/get-run-result";
import { runBaseline } from "@/features/runs/lib/compare-baseline";
import { MAX_COMPARED_RUNS, readCompareSelection, writeCompareSelection, type CompareSlot } from "@/features/runs/lib/compare-selection";
import { useSearchParamsWriter } from "@/lib/use-search-params-writer";
import { CompareView } from "@/features/runs/components/compare-view";
import { CompareSettings } from "@/features/runs/components/compare-settings";
import { ChartSourceProvider, runSourceLine } from "@/components/charts/chart-source";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Cautions } from "@/components/ui/cautions";
import { SearchPicker } from "@/components/search-picker/search-picker";
import { Field, Select } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";
import { ApprovedSeal, ExploratoryStamp } from "@/components/ui/badges";

/** One slot's run and result; always called four times, so the hooks keep their order. */
function useSlot(slot: CompareSlot | undefined) {
  const id = slot?.runId || undefined;
  return { run: useRun(id), result: useRunResult(id) };
}

const slotName = (i: number) => (i === 0 ? "Reference run" : `Run ${i + 1}`);

/** Only finished runs have results to compare. */
const finishedRuns = runPickerSource({ status: "succeeded" });
const runDetail = (r: RunSummary) =>
  `${r.modelVersion.name} v${r.modelVersion.versionNumber}${r.exploratory ? " (exploratory)" : " (approved)"}`;

/** Pick two to four finished runs (the first is the reference) and compare them on shared axes. */
export default function RunComparePage() {
  const [params, write] = useSearchParamsWriter();
  // Only whether any finished run exists; each slot's picker searches them all as someone types.
  const runs = useRuns({ status: "succeeded", limit: 1 });
  const slots = readCompareSelection(params);
  const loaded = [useSlot(slots[0]), useSlot(slots[1]), useSlot(slots[2]), useSlot(slots[3])].slice(0, slots.length);
  // Each change starts from the selection as last written (useSearchParamsWriter).
  const save = (change: (current: CompareSlot[]) => CompareSlot[]) =>
    write((prev) => writeCompareSelection(change(readCompareSelection(prev))), { replace: true });
  const setSlot = (i: number, change: Partial<CompareSlot>) => save((current) => current.map((s, k) => (k === i ? { ...s, ...change } : s)));

  const chosen = slots.map((s, i) => ({ slot: s, ...loaded[i]! })).filter((x) => x.slot.runId);
  const pending = chosen.some((x) => x.run.isPending || x.result.isPending);
  const failed = chosen.find((x) => x.run.isError || x.result.isError);
  const ready = chosen.length >= 2 && !pending && !failed;

  return (
    <>
      <PageHeader
        kicker="Runs"
        title="Compare"
        description="Two to four runs, or pathways of one run, side by side on the same warming axis; the first is the reference the differences are taken from."
      />
      {runs.isPending ? (
        <LoadingState />
      ) : runs.isError ? (
        <ErrorState error={runs.error} />
      ) : runs.data.total === 0 ? (
        <EmptyState title="No finished runs to compare" />
      ) : (
        <div className="flex flex-col gap-6">
          <Card>
            <CardBody className="grid gap-4 md:grid-cols-2 xl:grid-cols-4">
              {slots.map((slot, i) => {
                const { run, result } = loaded[i]!;
                return (
                  <div key={i} className="grid content-start gap-2">
                    <SearchPicker<RunSummary>
                      label={slotName(i)}
                      source={finishedRuns}
                      itemLabel={(r) => r.name}
                      itemDetail={runDetail}
                      value={slot.runId}
                      selected={run.data}
                      onChange={(runId) => setSlot(i, { runId, pathwayId: "" })}
                      placeholder="Type part of a run's name…"
                    />
                    {result.data && (
                      <Field label={`${slotName(i)}: pathway`}>
                        {(p) => (
                          <Select
                            {...p}
                            value={slot.pathwayId || result.data.pathways[0]?.id}
                            onChange={(e) => setSlot(i, { pathwayId: e.target.value })}
                          >
                            {result.data.pathways.map((pw) => (
                              <option key={pw.id} value={pw.id}>
                                {pw.name}
                              </option>
                            ))}
                          </Select>
                        )}
                      </Field>
                    )}
                    <div className="flex items-center gap-2">
                      {/* Every run says how it was made, so "approved versions only" reads at a glance. */}
                      {run.data &&
                        (run.data.exploratory ? <ExploratoryStamp size="sm" /> : <ApprovedSeal size="sm" className="self-start" />)}
                      {slots.length > 2 && (
                        <Button variant="secondary" size="sm" onClick={() => save((current) => current.filter((_, k) => k !== i))}>
                          Remove
                        </Button>
                      )}
                    </div>
                  </div>
                );
              })}
              {slots.length < MAX_COMPARED_RUNS && (
                <div className="flex items-start">
                  <Button variant="secondary" onClick={() => save((current) => [...current, { runId: "", pathwayId: "" }])}>
                    Add a run
                  </Button>
                </div>
              )}
            </CardBody>
          </Card>
          <Cautions />
          {chosen.length < 2 ? (
            <EmptyState title="Choose at least two runs">Pick the same run twice to compare two of its pathways.</EmptyState>
          ) : pending ? (
            <LoadingState label="Loading the results…" />
          ) : failed ? (
            <ErrorState error={failed.run.error ?? failed.result.error} />
          ) : (
            ready && <Compared chosen={chosen.map((x) => ({ slot: x.slot, run: x.run.data!, result: x.result.data! }))} />
          )}
        </div>
      )}
    </>
  );
}

function Compared({ chosen }: { chosen: Array<{ slot: CompareSlot; run: Run; result: RunResult }> }) {
  // Downloaded charts name every compared run, its model version and result hash.
  const source = { lines: chosen.map((x) => runSourceLine(x.run, x.result.resultHash, x.run.exploratory)), fileLabel: "compare" };
  return (
    <ChartSourceProvider source={source}>
      <Card>
        <CardHeader
          title="Settings that differ"
          subtitle="What was changed between the runs, so a difference in the figures can be traced to its cause."
        />
        <CardBody>
          <CompareSettings runs={chosen.map((x) => x.run)} />
        </CardBody>
      </Card>
      <Card className="mt-6">
        <CardBody>
          <CompareView
            sides={chosen.map((x) => ({
              label: x.run.name || x.run.id.slice(0, 8),
              result: x.result,
              pathwayId: x.slot.pathwayId || x.result.pathways[0]!.id,
              baseline: runBaseline(x.run),
            }))}
          />
        </CardBody>
      </Card>
    </ChartSourceProvider>
  );
}
