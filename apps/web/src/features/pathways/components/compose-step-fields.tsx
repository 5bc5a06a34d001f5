import { AGENT_LABELS, type ForcingAgent } from "@plumeline/contracts";
import { Field, Input, Select } from "@/components/ui/field";
import type { StepDraft } from "../lib/compose-step-draft";
import { PathwaySelect, type PathwayChoice } from "./pathway-select";

interface Props {
  draft: StepDraft;
  onChange: (next: StepDraft) => void;
  errors: Record<string, string>;
  /** Agents of the pathway this step applies to, with the unit each is given in. */
  agents: Array<{ agent: ForcingAgent; quantity: string }>;
  /** Years of the pathway this step applies to. */
  years: { first: number; last: number };
  /** Pathways already read, by id, so the splice or blend picker can show the one it names. */
  known: ReadonlyMap<string, PathwayChoice>;
}

const unitOf = (quantity: string) => (quantity === "erf" ? "W m-2" : quantity);

function AgentSelect({
  value,
  onChange,
  agents,
  error,
}: {
  value: string;
  onChange: (v: string) => void;
  agents: Props["agents"];
  error?: string;
}) {
  return (
    <Field label="Agent" error={error}>
      {(p) => (
        <Select {...p} value={value} onChange={(e) => onChange(e.target.value)}>
          {!agents.some((a) => a.agent === value) && (
            <option value={value}>{AGENT_LABELS[value as ForcingAgent] ?? value} (not in this pathway)</option>
          )}
          {agents.map((a) => (
            <option key={a.agent} value={a.agent}>
              {AGENT_LABELS[a.agent]} ({unitOf(a.quantity)})
            </option>
          ))}
        </Select>
      )}
    </Field>
  );
}

function YearInput({
  label,
  value,
  onChange,
  error,
  hint,
}: {
  label: string;
  value: string;
  onChange: (v: string) => void;
  error?: string;
  hint?: string;
}) {
  return (
    <Field label={label} error={error} hint={hint}>
      {(p) => <Input {...p} inputMode="numeric" value={value} onChange={(e) => onChange(e.target.value)} className="num" />}
    </Field>
  );
}

/** The boxes of one compose step; every change goes up as a new draft, checked by the composer. */
export function ComposeStepFields({ draft, onChange, errors, agents, years, known }: Props) {
  const grid = "grid gap-3 sm:grid-cols-2 lg:grid-cols-4";
  switch (draft.kind) {
    case "scale":
      return (
        <div className={grid}>
          <AgentSelect value={draft.agent} onChange={(agent) => onChange({ ...draft, agent })} agents={agents} error={errors.agent} />
          <Field label="Factor" error={errors.factor} hint="2 doubles the values; 0.5 halves them.">
            {(p) => (
              <Input
                {...p}
                inputMode="decimal"
                value={draft.factor}
                onChange={(e) => onChange({ ...draft, factor: e.target.value })}
                className="num"
              />
            )}
          </Field>
          <YearInput
            label="From year"
            value={draft.fromYear}
            onChange={(fromYear) => onChange({ ...draft, fromYear })}
            error={errors.fromYear}
            hint={`Empty: from ${years.first}`}
          />
          <YearInput
            label="To year"
            value={draft.toYear}
            onChange={(toYear) => onChange({ ...draft, toYear })}
            error={errors.toYear}
            hint={`Empty: to ${years.last}`}
          />
        </div>
      );
    case "splice":
      return (
        <div className={grid}>
          <AgentSelect value={draft.agent} onChange={(agent) => onChange({ ...draft, agent })} agents={agents} error={errors.agent} />
          <PathwaySelect
            label="Take values from"
            value={draft.sourcePathwayId}
            onChange={(sourcePathwayId) => onChange({ ...draft, sourcePathwayId })}
            selected={known.get(draft.sourcePathwayId)}
            error={errors.sourcePathwayId}
            hint="Same agent, same unit, same calendar years."
          />
          <YearInput
            label="From year"
            value={draft.fromYear}
            onChange={(fromYear) => onChange({ ...draft, fromYear })}
            error={errors.fromYear}
          />
          <YearInput
            label="To year"
            value={draft.toYear}
            onChange={(toYear) => onChange({ ...draft, toYear })}
            error={errors.toYear}
            hint="Both years included."
          />
        </div>
      );
    case "blend": {
      const w = Number(draft.weight);
      return (
        <div className={grid}>
          <PathwaySelect
            label="Blend with"
            value={draft.otherPathwayId}
            onChange={(otherPathwayId) => onChange({ ...draft, otherPathwayId })}
            selected={known.get(draft.otherPathwayId)}
            error={errors.otherPathwayId}
            hint={`Must cover the same years (${years.first}–${years.last}).`}
          />
          <Field
            label="Weight on the pathway so far (w)"
            error={errors.weight}
            hint={
              Number.isFinite(w) && w >= 0 && w <= 1
                ? `w·this + (1 − w)·other: ${w} of this, ${Number((1 - w).toPrecision(12))} of the other.`
                : "From 0 to 1."
            }
          >
            {(p) => (
              <Input
                {...p}
                inputMode="decimal"
                value={draft.weight}
                onChange={(e) => onChange({ ...draft, weight: e.target.value })}
                className="num"
              />
            )}
          </Field>
          <p className="text-xs text-muted sm:col-span-2">
            Agent by agent and year by year. An agent given as forcing in only one of the two counts as 0 W m-2 in the other (as an absent
            agent does in a run); a concentration present in only one is refused.
          </p>
        </div>
      );
    }
    case "extend":
      return (
        <div className={grid}>
          <YearInput
            label="Extend to year"
            value={draft.toYear}
            onChange={(toYear) => onChange({ ...draft, toYear })}
            error={errors.toYear}
            hint={`The pathway now ends in ${years.last}.`}
          />
          <Field label="How" error={errors.method}>
            {(p) => (
              <Select {...p} value={draft.method} onChange={(e) => onChange({ ...draft, method: e.target.value as "hold" | "linear" })}>
                <option value="hold">Hold each agent's last value</option>
                <option value="linear">Continue a linear trend</option>
              </Select>
            )}
          </Field>
          {draft.method === "linear" && (
            <Field
              label="Fit the trend over the last N years"
              error={errors.fitYears}
              hint={`Least-squares line through each agent's values in ${years.last - (Number(draft.fitYears) || 0) + 1}–${years.last}.`}
            >
              {(p) => (
                <Input
                  {...p}
                  inputMode="numeric"
                  value={draft.fitYears}
                  onChange={(e) => onChange({ ...draft, fitYears: e.target.value })}
                  className="num"
                />
              )}
            </Field>
          )}
        </div>
      );
  }
}
