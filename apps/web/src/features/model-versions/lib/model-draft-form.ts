import type { Distribution, ForcingAgent, ModelSpec, ModelVersionDefaults } from "@plumeline/contracts";
import { DEFAULT_INTERNAL_VARIABILITY } from "@plumeline/engine";

/** What the model editor starts from: a new draft, a copy of a version, or a draft to edit. */
export interface ModelDraft {
  name: string;
  notes: string;
  parentId: string | null;
  model: ModelSpec;
  defaults: ModelVersionDefaults;
  /** Peril profiles the version pins (runs that name none use these). */
  perilProfileIds?: string[];
}

export interface CorrelationRow {
  a: string;
  b: string;
  /** As typed: checked as a number when the form is sent. */
  rank: string;
}

export type ConstraintField = "from" | "to" | "observed" | "sd" | "internalVariability";
export type DefaultsField = "percentiles" | "thresholds" | "horizons" | "baseline";

/**
 * The editor's whole state: text fields hold what was typed (numbers are checked on submit), a
 * distribution is `null` while its editor holds something invalid.
 */
export interface ModelDraftForm {
  name: string;
  notes: string;
  climate: Record<string, Distribution | null>;
  agents: Partial<Record<ForcingAgent, Distribution | null>>;
  correlations: CorrelationRow[];
  constraintOn: boolean;
  constraint: Record<ConstraintField, string>;
  expression: ModelSpec["forcingExpression"];
  defaults: Record<DefaultsField, string>;
  perilProfileIds: string[];
  /** The agent chosen in "Add a scale factor for", before Add is pressed. */
  agentToAdd: ForcingAgent | "";
  /** Messages by field path, from the last submit. */
  errors: Record<string, string>;
}

export type ModelDraftAction =
  | { type: "name"; value: string }
  | { type: "notes"; value: string }
  | { type: "expression"; value: ModelSpec["forcingExpression"] }
  | { type: "climate"; input: string; distribution: Distribution | null }
  | { type: "agent"; agent: ForcingAgent; distribution: Distribution | null }
  | { type: "removeAgent"; agent: ForcingAgent }
  | { type: "chooseAgentToAdd"; agent: ForcingAgent | "" }
  | { type: "addChosenAgent" }
  | { type: "correlation"; index: number; field: keyof CorrelationRow; value: string }
  | { type: "addCorrelation" }
  | { type: "removeCorrelation"; index: number }
  | { type: "constraintOn"; on: boolean }
  | { type: "constraint"; field: ConstraintField; value: string }
  | { type: "defaults"; field: DefaultsField; value: string }
  | { type: "perilProfileIds"; ids: string[] }
  | { type: "errors"; errors: Record<string, string> };

/** A new agent's scale factor starts at 1 with a ±20 % range (90 % coverage): a neutral placeholder to edit. */
export const NEW_AGENT_SCALE: Distribution = { type: "range", p50: 1, low: 0.8, high: 1.2, coverage: 90, shape: "split-normal" };

/** A new correlation row: a placeholder pair to edit, not a recommended value. */
const NEW_CORRELATION: CorrelationRow = { a: "ecs", b: "aerosol-cloud", rank: "-0.3" };

/** The observational constraint's fields when a draft has none yet (editable starting values). */
const CONSTRAINT_START = { from: 2011, to: 2020, observed: 1.09, sd: 0.076, internalVariability: DEFAULT_INTERNAL_VARIABILITY };

export function initialModelDraftForm(initial: ModelDraft): ModelDraftForm {
  const c = initial.model.constraint ?? CONSTRAINT_START;
  return {
    name: initial.name,
    notes: initial.notes,
    climate: { ...initial.model.climate },
    agents: Object.fromEntries(Object.entries(initial.model.agents).map(([a, v]) => [a, v?.scale ?? null])),
    correlations: initial.model.correlations.map((x) => ({ a: x.between[0], b: x.between[1], rank: String(x.rank) })),
    constraintOn: initial.model.constraint !== null,
    constraint: {
      from: String(c.from),
      to: String(c.to),
      observed: String(c.observed),
      sd: String(c.sd),
      // A version saved before the field existed ran with the engine's default.
      internalVariability: String(c.internalVariability ?? DEFAULT_INTERNAL_VARIABILITY),
    },
    expression: initial.model.forcingExpression,
    defaults: {
      percentiles: initial.defaults.percentiles.join(", "),
      thresholds: initial.defaults.thresholds.join(", "),
      horizons: initial.defaults.horizons.join(", "),
      baseline: initial.defaults.baseline.join(", "),
    },
    perilProfileIds: initial.perilProfileIds ?? [],
    agentToAdd: "",
    errors: {},
  };
}

/** Every change the editor can make, in one place (pure: same state and action, same result). */
export function modelDraftReducer(state: ModelDraftForm, action: ModelDraftAction): ModelDraftForm {
  switch (action.type) {
    case "name":
      return { ...state, name: action.value };
    case "notes":
      return { ...state, notes: action.value };
    case "expression":
      return { ...state, expression: action.value };
    case "climate":
      return { ...state, climate: { ...state.climate, [action.input]: action.distribution } };
    case "agent":
      return { ...state, agents: { ...state.agents, [action.agent]: action.distribution } };
    case "removeAgent": {
      const { [action.agent]: _removed, ...agents } = state.agents;
      return { ...state, agents };
    }
    case "chooseAgentToAdd":
      return { ...state, agentToAdd: action.agent };
    case "addChosenAgent":
      if (!state.agentToAdd) return state;
      return { ...state, agents: { ...state.agents, [state.agentToAdd]: NEW_AGENT_SCALE }, agentToAdd: "" };
    case "correlation":
      return { ...state, correlations: state.correlations.map((row, i) => (i === action.index ? { ...row, [action.field]: action.value } : row)) };
    case "addCorrelation":
      return { ...state, correlations: [...state.correlations, NEW_CORRELATION] };
    case "removeCorrelation":
      return { ...state, correlations: state.correlations.filter((_, i) => i !== action.index) };
    case "constraintOn":
      return { ...state, constraintOn: action.on };
    case "constraint":
      return { ...state, constraint: { ...state.constraint, [action.field]: action.value } };
    case "defaults":
      return { ...state, defaults: { ...state.defaults, [action.field]: action.value } };
    case "perilProfileIds":
      return { ...state, perilProfileIds: action.ids };
    case "errors":
      return { ...state, errors: action.errors };
  }
}
