import { useMemo, useState } from "react";
import { changedAgents, describeRecipe, type Pathway, type PathwayData } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { ErrorState } from "@/components/ui/states";
import { usePathwaysByIds } from "../api/get-pathway";
import { newStepDraft, referencedPathwayIds, type StepDraft, type StepKind } from "../lib/compose-step-draft";
import { evaluateComposeDrafts } from "../lib/evaluate-compose-drafts";
import { ComposeComparisonCharts } from "./compose-comparison-charts";
import { ComposeStepCard, STEP_TITLES } from "./compose-step-card";
import type { PathwayChoice } from "./pathway-select";
import { ComposedPathwaySave } from "./composed-pathway-save";

const KINDS: StepKind[] = ["scale", "splice", "blend", "extend"];

/**
 * Compose a new pathway from an existing one with form steps — scale, splice, blend, extend —
 * each applied live with the same pure operations the API replays, each drawn against the
 * base. The result is saved as a new pathway with its recipe; the base is never changed.
 */
export function PathwayComposer({ base, onSaved }: { base: Pathway; onSaved: (p: Pathway) => void }) {
  const [drafts, setDrafts] = useState<StepDraft[]>([]);
  const ids = referencedPathwayIds(drafts);
  const others = usePathwaysByIds(ids);
  const loadedById = new Map<string, PathwayData>();
  // The pathways the steps read, by id: their names label the step pickers and the recipe.
  const known = new Map<string, PathwayChoice>([[base.id, base]]);
  others.forEach((q, i) => {
    if (q.data) {
      loadedById.set(ids[i]!, { startYear: q.data.startYear, agents: q.data.agents });
      known.set(q.data.id, q.data);
    }
  });
  const failedLoad = others.find((q) => q.isError);
  const baseData: PathwayData = useMemo(() => ({ startYear: base.startYear, agents: base.agents }), [base]);
  const { states, steps, result } = evaluateComposeDrafts(baseData, drafts, (id) => (id === base.id ? baseData : loadedById.get(id)));
  const recipe = { basePathwayId: base.id, steps };
  const recipeText = describeRecipe(recipe, (id) => known.get(id)?.name ?? id);

  // Each step applies to the result of the one before; a step after a refused one shows the last good state's boxes.
  const inputs = drafts.map((_, i) => {
    for (let k = i - 1; k >= 0; k--) {
      const s = states[k];
      if (s?.status === "applied") return s.after;
    }
    return baseData;
  });
  const last = result ?? inputs.at(-1) ?? baseData;

  const update = (i: number, next: StepDraft) => setDrafts((d) => d.map((x, k) => (k === i ? next : x)));
  const remove = (i: number) => setDrafts((d) => d.filter((_, k) => k !== i));
  const add = (kind: StepKind) => setDrafts((d) => [...d, newStepDraft(kind, last)]);

  return (
    <div className="flex flex-col gap-6">
      <p className="text-sm text-muted">
        Starting from <span className="font-medium text-ink">{base.name}</span> ({base.startYear}–{base.endYear}). Steps apply in order,
        each to the result of the one before; the base pathway is not changed. Each chart draws the base against the pathway after that
        step.
      </p>
      {failedLoad && <ErrorState title="Another pathway could not be read" error={failedLoad.error} />}
      {drafts.map((draft, i) => (
        <ComposeStepCard
          key={draft.key}
          index={i}
          draft={draft}
          state={states[i]!}
          input={inputs[i]!}
          base={baseData}
          baseName={base.name}
          known={known}
          onChange={(next) => update(i, next)}
          onRemove={() => remove(i)}
        />
      ))}
      <div className="flex flex-wrap items-center gap-2" role="group" aria-label="Add a step">
        <span className="text-sm font-medium text-ink">Add a step:</span>
        {KINDS.map((kind) => (
          <Button key={kind} variant="secondary" size="sm" onClick={() => add(kind)}>
            {STEP_TITLES[kind]}
          </Button>
        ))}
      </div>
      <Card aria-labelledby="composed-result">
        <CardHeader id="composed-result" title="Result" subtitle="Checked as an upload is: same schema, same server checks." />
        <CardBody className="flex flex-col gap-6">
          {result && drafts.length > 0 && (
            <ComposeComparisonCharts
              base={baseData}
              baseLabel={`Base: ${base.name}`}
              composed={result}
              composedLabel="Composed"
              changed={changedAgents(baseData, result)}
              titlePrefix="Composed"
            />
          )}
          <ComposedPathwaySave
            initial={{ name: `${base.name} (composed)`.slice(0, 120), source: base.source, vintage: base.vintage, description: "" }}
            composed={result}
            recipe={recipe}
            recipeText={recipeText}
            onSaved={onSaved}
          />
        </CardBody>
      </Card>
    </div>
  );
}
