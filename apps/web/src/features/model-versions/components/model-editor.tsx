import { useEffect, useReducer, type SubmitEvent } from "react";
import {
  AGENT_LABELS,
  CLIMATE_INPUTS,
  CLIMATE_INPUT_UNITS,
  FORCING_AGENTS,
  FORCING_EXPRESSIONS,
  createModelVersionBodySchema,
  formatPath,
  type CreateModelVersionBody,
  type ForcingAgent,
} from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { CLIMATE_INPUT_LABELS, inputLabel, SCALE_FACTOR_UNIT } from "@/lib/input-labels";
import { DistributionEditor } from "./distribution-editor";
import type { PickerSource } from "@/components/search-picker/picker-source";
import { PinnedPerilProfilesPicker, type PinnableProfile } from "./pinned-peril-profiles";
import { parseNumbers } from "@/lib/parse-numbers";
import { initialModelDraftForm, modelDraftReducer, NEW_AGENT_SCALE, type ModelDraft, type ModelDraftForm } from "../lib/model-draft-form";

export type { ModelDraft } from "../lib/model-draft-form";

const EXPRESSION_LABELS: Record<string, string> = {
  ar6: "AR6 refit (IPCC AR6 WGI Ch. 7)",
  "etminan-2016": "Etminan et al. 2016",
  "myhre-1998": "Myhre et al. 1998 (logarithmic CO2)",
};

/**
 * Drafting a model version: every input's distribution with its live preview, forcing
 * scale factors per agent, rank correlations, the observational constraint and the run
 * defaults. The body is checked with the API's schema before it is sent; messages appear
 * beside the field they concern.
 */
export function ModelEditor({
  initial,
  submitLabel,
  pending,
  serverError,
  onSave,
  perilProfiles,
  startingForm,
  onFormChange,
}: {
  initial: ModelDraft;
  submitLabel: string;
  pending: boolean;
  serverError: unknown;
  onSave: (body: CreateModelVersionBody) => void;
  /** Where to search for profiles to pin, and the pinned ones' records (without it the picker is not shown; the pins are always sent). */
  perilProfiles?: { source: PickerSource<PinnableProfile>; known: readonly PinnableProfile[] } | undefined;
  /** The form state to start from instead of `initial`'s (a draft restored from this browser). */
  startingForm?: ModelDraftForm;
  /** Told every state of the form, so the page can keep it and know whether it is saved. */
  onFormChange?: (form: ModelDraftForm) => void;
}) {
  // One reducer holds the whole form (lib/model-draft-form.ts); the fields below read from it.
  const [form, dispatch] = useReducer(modelDraftReducer, initial, (i) => startingForm ?? initialModelDraftForm(i));
  useEffect(() => onFormChange?.(form), [form, onFormChange]);
  const { name, notes, climate, agents, correlations, constraintOn, constraint, expression, defaults, perilProfileIds, errors } = form;
  const addAgent = form.agentToAdd;
  const inputs = [...CLIMATE_INPUTS, ...FORCING_AGENTS];

  function submit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const next: Record<string, string> = {};
    const badInput = [...Object.entries(climate), ...Object.entries(agents)].filter(([, d]) => d === null).map(([k]) => inputLabel(k));
    if (badInput.length) next.inputs = `Fix the distribution of: ${badInput.join(", ")}`;
    const lists = Object.fromEntries(Object.entries(defaults).map(([k, v]) => [k, parseNumbers(v)]));
    for (const [k, v] of Object.entries(lists)) if ("bad" in v) next[`defaults.${k}`] = `"${v.bad}" is not a number`;
    const num = (v: string) => (v.trim() === "" ? Number.NaN : Number(v));
    const body = {
      name,
      notes,
      parentId: initial.parentId,
      model: {
        climate,
        agents: Object.fromEntries(Object.entries(agents).map(([a, d]) => [a, { scale: d }])),
        correlations: correlations.map((c) => ({ between: [c.a, c.b], rank: num(c.rank) })),
        constraint: constraintOn
          ? {
              from: num(constraint.from),
              to: num(constraint.to),
              observed: num(constraint.observed),
              sd: num(constraint.sd),
              internalVariability: num(constraint.internalVariability),
            }
          : null,
        forcingExpression: expression,
      },
      defaults: Object.fromEntries(Object.entries(lists).map(([k, v]) => [k, "values" in v ? v.values : []])),
      perilProfileIds,
    };
    if (Object.keys(next).length === 0) {
      const parsed = createModelVersionBodySchema.safeParse(body);
      if (!parsed.success) {
        for (const i of parsed.error.issues)
          next[formatPath(i.path.filter((p): p is string | number => typeof p !== "symbol"))] ??= i.message;
      } else {
        dispatch({ type: "errors", errors: {} });
        onSave(body as CreateModelVersionBody);
        return;
      }
    }
    dispatch({ type: "errors", errors: next });
  }

  const err = (path: string) => errors[path];
  const errorList = Object.entries(errors);

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-6">
      <Card>
        <CardHeader title="About this version" />
        <CardBody className="grid gap-4 lg:grid-cols-2">
          <Field label="Name" error={err("name")}>
            {(p) => <Input {...p} value={name} onChange={(e) => dispatch({ type: "name", value: e.target.value })} maxLength={120} />}
          </Field>
          <Field label="Concentration-to-forcing expression" hint="Used for pathways given as CO2/CH4/N2O concentrations.">
            {(p) => (
              <Select
                {...p}
                value={expression}
                onChange={(e) => dispatch({ type: "expression", value: e.target.value as typeof expression })}
              >
                {FORCING_EXPRESSIONS.map((x) => (
                  <option key={x} value={x}>
                    {EXPRESSION_LABELS[x] ?? x}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Field
            label="Notes: sources and justification"
            error={err("notes")}
            className="lg:col-span-2"
            hint="Cite where every assumption comes from; reviewers read this."
          >
            {(p) => <Textarea {...p} value={notes} onChange={(e) => dispatch({ type: "notes", value: e.target.value })} rows={5} />}
          </Field>
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Climate response" subtitle="Two-layer energy balance model inputs. Each preview updates as you type." />
        <CardBody className="flex flex-col gap-3">
          {CLIMATE_INPUTS.map((k) => (
            <DistributionEditor
              key={k}
              id={k}
              label={CLIMATE_INPUT_LABELS[k]}
              unit={CLIMATE_INPUT_UNITS[k]}
              value={initial.model.climate[k]}
              onChange={(d) => dispatch({ type: "climate", input: k, distribution: d })}
            />
          ))}
        </CardBody>
      </Card>

      <Card>
        <CardHeader
          title="Forcing scale factors"
          subtitle="Each member multiplies an agent's series by a sampled factor. Agents not listed keep a factor of exactly 1."
        />
        <CardBody className="flex flex-col gap-3">
          {FORCING_AGENTS.filter((a) => a in agents).map((a) => (
            <div key={a} className="relative">
              <DistributionEditor
                id={a}
                label={`${AGENT_LABELS[a]} scale`}
                unit={SCALE_FACTOR_UNIT}
                value={initial.model.agents[a]?.scale ?? NEW_AGENT_SCALE}
                onChange={(d) => dispatch({ type: "agent", agent: a, distribution: d })}
              />
              <button
                type="button"
                className="absolute bottom-2 right-3 text-xs text-danger hover:underline"
                onClick={() => dispatch({ type: "removeAgent", agent: a })}
              >
                Remove {AGENT_LABELS[a]}
              </button>
            </div>
          ))}
          <div className="flex items-end gap-2">
            <label className="flex flex-col gap-1 text-sm">
              <span className="font-medium text-ink">Add a scale factor for</span>
              <Select
                value={addAgent}
                onChange={(e) => dispatch({ type: "chooseAgentToAdd", agent: e.target.value as ForcingAgent | "" })}
                className="w-64"
              >
                <option value="">Choose an agent…</option>
                {FORCING_AGENTS.filter((a) => !(a in agents)).map((a) => (
                  <option key={a} value={a}>
                    {AGENT_LABELS[a]}
                  </option>
                ))}
              </Select>
            </label>
            <Button variant="secondary" disabled={!addAgent} onClick={() => dispatch({ type: "addChosenAgent" })}>
              Add
            </Button>
          </div>
        </CardBody>
      </Card>

      <Card>
        <CardHeader
          title="Rank correlations"
          subtitle="Imposed between sampled inputs by Iman–Conover; leave empty for independent inputs."
        />
        <CardBody className="flex flex-col gap-2">
          {correlations.map((c, i) => (
            <div key={i} className="flex flex-wrap items-start gap-2" data-correlation={i}>
              <Select
                aria-label={`Correlation ${i + 1}: first input`}
                value={c.a}
                onChange={(e) => dispatch({ type: "correlation", index: i, field: "a", value: e.target.value })}
                className="w-56"
              >
                {inputs.map((k) => (
                  <option key={k} value={k}>
                    {inputLabel(k)}
                  </option>
                ))}
              </Select>
              <Select
                aria-label={`Correlation ${i + 1}: second input`}
                value={c.b}
                onChange={(e) => dispatch({ type: "correlation", index: i, field: "b", value: e.target.value })}
                className="w-56"
              >
                {inputs.map((k) => (
                  <option key={k} value={k}>
                    {inputLabel(k)}
                  </option>
                ))}
              </Select>
              <div className="flex flex-col">
                <Input
                  aria-label={`Correlation ${i + 1}: rank correlation`}
                  className="num w-24"
                  value={c.rank}
                  onChange={(e) => dispatch({ type: "correlation", index: i, field: "rank", value: e.target.value })}
                  aria-invalid={err(`model.correlations[${i}].rank`) ? true : undefined}
                />
              </div>
              <Button variant="ghost" size="sm" onClick={() => dispatch({ type: "removeCorrelation", index: i })}>
                Remove
              </Button>
              {(err(`model.correlations[${i}].rank`) || err(`model.correlations[${i}].between`)) && (
                <p role="alert" className="basis-full text-xs font-medium text-danger">
                  {err(`model.correlations[${i}].rank`)
                    ? `Rank ${err(`model.correlations[${i}].rank`)}`
                    : err(`model.correlations[${i}].between`)}
                </p>
              )}
            </div>
          ))}
          <div>
            <Button variant="secondary" size="sm" onClick={() => dispatch({ type: "addCorrelation" })}>
              Add correlation
            </Button>
          </div>
        </CardBody>
      </Card>

      <Card>
        <CardHeader
          title="Observational constraint"
          subtitle="Weights members by how well their warming over an observed window matches the observation."
        />
        <CardBody className="flex flex-col gap-3">
          <label className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={constraintOn}
              onChange={(e) => dispatch({ type: "constraintOn", on: e.target.checked })}
              className="accent-[var(--pl-accent)]"
            />
            Weight members by observed warming
          </label>
          {constraintOn && (
            <div className="grid gap-3 sm:grid-cols-5">
              {(
                [
                  ["from", "Window from (year)"],
                  ["to", "Window to (year)"],
                  ["observed", "Observed warming (K)"],
                  ["sd", "Observation sd (K)"],
                  ["internalVariability", "Internal variability sd (K)"],
                ] as const
              ).map(([k, label]) => (
                <Field key={k} label={label} error={err(`model.constraint.${k}`)}>
                  {(p) => (
                    <Input
                      {...p}
                      className="num"
                      value={constraint[k]}
                      onChange={(e) => dispatch({ type: "constraint", field: k, value: e.target.value })}
                    />
                  )}
                </Field>
              ))}
              <p className="text-xs text-muted sm:col-span-5">
                AR6 SPM A.1.2: 2011–2020 was 1.09 K [0.95–1.20] above 1850–1900; sd 0.076 K treats that range as 5–95 %. Internal
                variability (added to the observation sd in quadrature): 0.21 K reads AR6 SPM A.1.3&apos;s −0.2 to +0.2 °C for 2010–2019 as
                a 17–83 % range; 0 ignores it.
              </p>
            </div>
          )}
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Run defaults" subtitle="Runs of this version start from these; a run may override horizons and thresholds." />
        <CardBody className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
          {(
            [
              ["percentiles", "Percentiles"],
              ["thresholds", "Thresholds (K)"],
              ["horizons", "Horizons (years)"],
              ["baseline", "Baseline period (first, last year)"],
            ] as const
          ).map(([k, label]) => (
            <Field
              key={k}
              label={label}
              error={err(`defaults.${k}`) ?? Object.entries(errors).find(([p]) => p.startsWith(`defaults.${k}[`))?.[1]}
            >
              {(p) => (
                <Input
                  {...p}
                  className="num"
                  value={defaults[k]}
                  onChange={(e) => dispatch({ type: "defaults", field: k, value: e.target.value })}
                />
              )}
            </Field>
          ))}
        </CardBody>
      </Card>

      {perilProfiles && (
        <Card>
          <CardHeader
            title="Pinned peril profiles"
            subtitle="Reviewed with this version; a run of it that names no profiles applies these."
          />
          <CardBody>
            <PinnedPerilProfilesPicker
              source={perilProfiles.source}
              known={perilProfiles.known}
              value={perilProfileIds}
              onChange={(ids) => dispatch({ type: "perilProfileIds", ids })}
            />
            {err("perilProfileIds") && <p className="mt-2 text-sm text-danger">{err("perilProfileIds")}</p>}
          </CardBody>
        </Card>
      )}

      {errorList.length > 0 && (
        <div role="alert" className="rounded-md border border-danger/40 bg-danger-soft px-4 py-3 text-sm">
          <p className="font-semibold text-danger">The version cannot be saved yet</p>
          <ul className="mt-1 list-disc pl-5">
            {errorList.slice(0, 12).map(([path, message]) => (
              <li key={path}>{path === "inputs" ? message : `${path} ${message}`}</li>
            ))}
          </ul>
        </div>
      )}
      {serverError ? <ErrorState error={serverError} /> : null}
      <div className="sticky bottom-0 -mx-2 flex gap-2 border-t border-line bg-canvas/95 px-2 py-3 backdrop-blur">
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : submitLabel}
        </Button>
      </div>
    </form>
  );
}
