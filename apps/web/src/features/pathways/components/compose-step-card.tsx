import { lastYear, presentAgents, type PathwayData } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Spinner } from "@/components/ui/states";
import type { StepDraft, StepKind } from "../lib/compose-step-draft";
import type { StepState } from "../lib/evaluate-compose-drafts";
import { ComposeComparisonCharts } from "./compose-comparison-charts";
import { ComposeStepFields } from "./compose-step-fields";
import type { PathwayChoice } from "./pathway-select";

export const STEP_TITLES: Record<StepKind, string> = {
  scale: "Scale an agent",
  splice: "Splice years from another pathway",
  blend: "Blend with another pathway",
  extend: "Extend beyond the last year",
};

/** One step: its boxes, what became of it, and (once it applies) base against the result so far. */
export function ComposeStepCard({
  index,
  draft,
  state,
  input,
  base,
  baseName,
  known,
  onChange,
  onRemove,
}: {
  index: number;
  draft: StepDraft;
  state: StepState;
  /** The pathway this step applies to (the base, or the result of the step before). */
  input: PathwayData;
  base: PathwayData;
  baseName: string;
  /** Pathways already read, by id, so a step's picker can show the one it names. */
  known: ReadonlyMap<string, PathwayChoice>;
  onChange: (next: StepDraft) => void;
  onRemove: () => void;
}) {
  const n = index + 1;
  const errors = state.status === "invalid" || state.status === "failed" ? state.errors : {};
  const id = `compose-step-${n}`;
  return (
    <Card aria-labelledby={id}>
      <CardHeader
        id={id}
        title={`Step ${n}: ${STEP_TITLES[draft.kind]}`}
        actions={
          <Button variant="ghost" size="sm" onClick={onRemove} aria-label={`Remove step ${n}`}>
            Remove
          </Button>
        }
      />
      <CardBody className="flex flex-col gap-4">
        <ComposeStepFields
          draft={draft}
          onChange={onChange}
          errors={errors}
          agents={presentAgents(input.agents).map((s) => ({ agent: s.agent, quantity: s.quantity }))}
          years={{ first: input.startYear, last: lastYear(input) }}
          known={known}
        />
        {state.status === "loading" && (
          <p role="status" className="flex items-center gap-2 text-sm text-muted">
            <Spinner /> Reading the other pathway's numbers…
          </p>
        )}
        {state.status === "blocked" && <p className="text-sm text-muted">Not applied yet: this step {state.reason}.</p>}
        {(state.status === "invalid" || state.status === "failed") && (
          <p role="alert" className="text-sm font-medium text-danger">
            Step {n} is not applied:{" "}
            {Object.entries(state.errors)
              .map(([field, message]) => `${field} ${message}`)
              .join("; ")}
          </p>
        )}
        {state.status === "applied" && (
          <>
            <p className="text-sm text-muted">
              Changed:{" "}
              {state.changed.length === 0
                ? "nothing (the numbers are the same as before this step)"
                : `${state.changed.length} ${state.changed.length === 1 ? "agent" : "agents"}`}
              ; the pathway now covers {state.after.startYear}–{lastYear(state.after)}.
            </p>
            <ComposeComparisonCharts
              base={base}
              baseLabel={`Base: ${baseName}`}
              composed={state.after}
              composedLabel={`After step ${n}`}
              changed={state.changed}
              titlePrefix={`Step ${n}`}
            />
          </>
        )}
      </CardBody>
    </Card>
  );
}
