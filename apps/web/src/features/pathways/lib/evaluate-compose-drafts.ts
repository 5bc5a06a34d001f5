import { applyStep, changedAgents, ComposeStepError, type ComposeStep, type ForcingAgent, type PathwayData } from "@plumeline/contracts";
import { parseStepDraft, type StepDraft } from "./compose-step-draft";

/** What became of one step of the form, in order. */
export type StepState =
  | { status: "invalid"; errors: Record<string, string> }
  | { status: "loading" }
  | { status: "failed"; errors: Record<string, string> }
  | { status: "applied"; before: PathwayData; after: PathwayData; changed: ForcingAgent[] }
  | { status: "blocked"; reason: string };

/**
 * Runs the form's steps on the base pathway, one after another, with the same pure operations
 * the API replays. A step that is invalid, still waiting for another pathway's numbers, or
 * refused blocks every later step (they would start from the wrong numbers), and there is no
 * result to save until every step applies.
 */
export function evaluateComposeDrafts(
  base: PathwayData,
  drafts: readonly StepDraft[],
  loaded: (id: string) => PathwayData | undefined,
): { states: StepState[]; steps: ComposeStep[]; result: PathwayData | undefined } {
  const states: StepState[] = [];
  const steps: ComposeStep[] = [];
  let current: PathwayData | undefined = base;
  drafts.forEach((draft) => {
    if (!current) {
      states.push({ status: "blocked", reason: `waits for step ${states.findIndex((s) => s.status !== "applied") + 1}` });
      return;
    }
    const parsed = parseStepDraft(draft);
    if (!parsed.ok) {
      states.push({ status: "invalid", errors: parsed.errors });
      current = undefined;
      return;
    }
    const step = parsed.step;
    const other = step.kind === "splice" ? step.sourcePathwayId : step.kind === "blend" ? step.otherPathwayId : undefined;
    if (other !== undefined && !loaded(other)) {
      states.push({ status: "loading" });
      current = undefined;
      return;
    }
    try {
      const after = applyStep(current, step, loaded);
      states.push({ status: "applied", before: current, after, changed: changedAgents(current, after) });
      steps.push(step);
      current = after;
    } catch (e) {
      if (!(e instanceof ComposeStepError)) throw e;
      states.push({ status: "failed", errors: { [e.field]: e.message.slice(e.field.length + 1) } });
      current = undefined;
    }
  });
  return { states, steps, result: current };
}
