import {
  composeStepSchema,
  lastYear,
  MAX_YEAR,
  pathwayLength,
  presentAgents,
  type ComposeStep,
  type PathwayData,
} from "@plumeline/contracts";

/**
 * A compose step as the form holds it: every box as typed (text), so a half-typed number
 * stays on screen. `parseStepDraft` turns it into a checked step, or names each bad box.
 */
export type StepDraft =
  | { key: string; kind: "scale"; agent: string; factor: string; fromYear: string; toYear: string }
  | { key: string; kind: "splice"; agent: string; sourcePathwayId: string; fromYear: string; toYear: string }
  | { key: string; kind: "blend"; otherPathwayId: string; weight: string }
  | { key: string; kind: "extend"; toYear: string; method: "hold" | "linear"; fitYears: string };

export type StepKind = StepDraft["kind"];

let counter = 0;
const nextKey = () => `step-${++counter}`;

/** How many trailing years a new linear extension is fitted over, unless the pathway is shorter (common practice: a few decades smooths year-to-year noise). */
export const DEFAULT_FIT_YEARS = 30;
/** How far past the last year a new extension reaches by default. */
const DEFAULT_EXTENSION_YEARS = 50;

/** A new step with defaults taken from the pathway it will apply to (its first agent, all its years). */
export function newStepDraft(kind: StepKind, current: PathwayData, otherPathwayId = ""): StepDraft {
  const agent = presentAgents(current.agents)[0]?.agent ?? "co2";
  const from = String(current.startYear);
  const to = String(lastYear(current));
  switch (kind) {
    case "scale":
      return { key: nextKey(), kind, agent, factor: "1", fromYear: from, toYear: to };
    case "splice":
      return { key: nextKey(), kind, agent, sourcePathwayId: otherPathwayId, fromYear: from, toYear: to };
    case "blend":
      return { key: nextKey(), kind, otherPathwayId, weight: "0.5" };
    case "extend":
      return {
        key: nextKey(),
        kind,
        toYear: String(Math.min(MAX_YEAR, lastYear(current) + DEFAULT_EXTENSION_YEARS)),
        method: "hold",
        fitYears: String(Math.min(DEFAULT_FIT_YEARS, Math.max(2, pathwayLength(current)))),
      };
  }
}

/** A typed number box: empty stays undefined (optional fields), text that is not a number stays text so the schema names it. */
function numberOrText(text: string): number | string | undefined {
  const t = text.trim();
  if (t === "") return undefined;
  const n = Number(t);
  return Number.isFinite(n) ? n : t;
}

export type ParsedStep = { ok: true; step: ComposeStep } | { ok: false; errors: Record<string, string> };

/** Checks a draft with the recipe's own schema (the one the API replays); one message per box. */
export function parseStepDraft(draft: StepDraft): ParsedStep {
  const raw =
    draft.kind === "scale"
      ? {
          kind: draft.kind,
          agent: draft.agent,
          factor: numberOrText(draft.factor) ?? "",
          fromYear: numberOrText(draft.fromYear),
          toYear: numberOrText(draft.toYear),
        }
      : draft.kind === "splice"
        ? {
            kind: draft.kind,
            agent: draft.agent,
            sourcePathwayId: draft.sourcePathwayId,
            fromYear: numberOrText(draft.fromYear) ?? "",
            toYear: numberOrText(draft.toYear) ?? "",
          }
        : draft.kind === "blend"
          ? { kind: draft.kind, otherPathwayId: draft.otherPathwayId, weight: numberOrText(draft.weight) ?? "" }
          : {
              kind: draft.kind,
              toYear: numberOrText(draft.toYear) ?? "",
              method: draft.method,
              fitYears: draft.method === "linear" ? numberOrText(draft.fitYears) : undefined,
            };
  const parsed = composeStepSchema.safeParse(raw);
  if (parsed.success) return { ok: true, step: parsed.data };
  const errors: Record<string, string> = {};
  for (const issue of parsed.error.issues) errors[String(issue.path[0] ?? "kind")] ??= issue.message;
  return { ok: false, errors };
}

/** The pathways a list of drafts reads besides the base (splice sources, blend partners). */
export function referencedPathwayIds(drafts: readonly StepDraft[]): string[] {
  const ids = drafts
    .flatMap((d) => (d.kind === "splice" ? [d.sourcePathwayId] : d.kind === "blend" ? [d.otherPathwayId] : []))
    .filter(Boolean);
  return [...new Set(ids)];
}
