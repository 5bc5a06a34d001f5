import { SUGGESTED_PERILS } from "@plumeline/contracts";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { Segmented } from "@/components/ui/segmented";
import { RATE_PARAMS, RATE_TYPE_LABELS, type ProfileDraft, type RateType } from "../lib/profile-draft";
import { ReturnPeriodTablesEditor } from "./return-period-tables-editor";

/**
 * The profile editor's fields. Controlled: the draft lives in the route so the preview curve
 * can follow it. `errors` are keyed by API field path ("scaling.rate.low") and shown beside
 * the field they belong to; `readOnly` shows a locked profile without inputs that could change.
 */
export function PerilProfileForm({
  draft,
  onChange,
  errors = {},
  readOnly = false,
}: {
  draft: ProfileDraft;
  onChange: (next: ProfileDraft) => void;
  errors?: Record<string, string>;
  readOnly?: boolean;
}) {
  const set = <K extends keyof ProfileDraft>(key: K, value: ProfileDraft[K]) => onChange({ ...draft, [key]: value });
  const text = (key: "name" | "peril" | "region" | "baselineWarming" | "source") => ({
    value: draft[key],
    disabled: readOnly,
    onChange: (e: { target: { value: string } }) => set(key, e.target.value),
  });
  const setRateType = (type: RateType) => {
    const keep = Object.fromEntries(RATE_PARAMS[type].map((d) => [d.key, draft.rate[d.key] ?? ""]));
    onChange({ ...draft, rateType: type, rate: keep });
  };

  return (
    // Container queries, not viewport ones: the form sits beside its preview on wide screens, so
    // its own width (not the window's) decides when two fields fit side by side.
    <div className="@container flex flex-col gap-4">
      <div className="grid gap-4 @lg:grid-cols-2">
        <Field label="Name" error={errors.name}>
          {(a) => <Input {...a} {...text("name")} />}
        </Field>
        <Field label="Region" hint="Exactly as the portfolio rows name it, so they match." error={errors.region}>
          {(a) => <Input {...a} {...text("region")} />}
        </Field>
        <Field label="Peril" hint="A lower-case slug; portfolio rows with the same peril and region are projected." error={errors.peril}>
          {(a) => (
            <>
              <Input {...a} {...text("peril")} list="peril-suggestions" />
              <datalist id="peril-suggestions">
                {SUGGESTED_PERILS.map((p) => (
                  <option key={p} value={p} />
                ))}
              </datalist>
            </>
          )}
        </Field>
        <Field
          label="Warming already in the risk view (K above 1850–1900)"
          hint="0–3 K. Multipliers apply only to warming beyond this."
          error={errors.baselineWarming}
        >
          {(a) => <Input {...a} {...text("baselineWarming")} inputMode="decimal" />}
        </Field>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <span className="text-sm font-medium text-ink">Metric</span>
        {readOnly ? (
          <span className="text-sm">{draft.metric}</span>
        ) : (
          <Segmented
            label="Metric"
            value={draft.metric}
            onChange={(v) => set("metric", v)}
            options={[
              { value: "frequency", label: "Frequency (shifts return periods)" },
              { value: "severity", label: "Severity (scales losses)" },
            ]}
          />
        )}
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <span className="text-sm font-medium text-ink">Scaling</span>
        {readOnly ? (
          <span className="text-sm">{draft.kind === "table" ? "table of multipliers" : "per-kelvin rate"}</span>
        ) : (
          <Segmented
            label="Scaling"
            value={draft.kind}
            onChange={(v) => set("kind", v)}
            options={[
              { value: "per-kelvin", label: "Rate per kelvin" },
              { value: "table", label: "Tables by warming level and return period" },
            ]}
          />
        )}
      </div>
      {errors.scaling && (
        <p className="text-xs font-medium text-danger" role="alert">
          {errors.scaling}
        </p>
      )}

      {draft.kind === "per-kelvin" ? (
        <fieldset className="rounded-md border border-line p-3">
          <legend className="px-1 text-xs text-muted">multiplier = (1 + r)^(warming − warming in risk view), r uncertain</legend>
          <div className="grid gap-3 @2xl:grid-cols-2">
            <Field label="Distribution of r">
              {(a) => (
                <Select {...a} value={draft.rateType} disabled={readOnly} onChange={(e) => setRateType(e.target.value as RateType)}>
                  {(Object.keys(RATE_TYPE_LABELS) as RateType[]).map((t) => (
                    <option key={t} value={t}>
                      {RATE_TYPE_LABELS[t]}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
            {draft.rateType === "range" && (
              <div className="grid grid-cols-2 gap-3">
                <Field label="Range covers">
                  {(a) => (
                    <Select
                      {...a}
                      value={draft.coverage}
                      disabled={readOnly}
                      onChange={(e) => set("coverage", e.target.value as "90" | "66")}
                    >
                      <option value="90">5–95 %</option>
                      <option value="66">17–83 %</option>
                    </Select>
                  )}
                </Field>
                <Field label="Fitted as">
                  {(a) => (
                    <Select
                      {...a}
                      value={draft.shape}
                      disabled={readOnly}
                      onChange={(e) => set("shape", e.target.value as "lognormal" | "split-normal")}
                    >
                      <option value="split-normal">split-normal</option>
                      <option value="lognormal">lognormal</option>
                    </Select>
                  )}
                </Field>
              </div>
            )}
            {RATE_PARAMS[draft.rateType].map((def) => (
              <Field key={def.key} label={def.label} error={errors[`scaling.rate.${def.key}`]}>
                {(a) => (
                  <Input
                    {...a}
                    inputMode="decimal"
                    value={draft.rate[def.key] ?? ""}
                    disabled={readOnly}
                    onChange={(e) => set("rate", { ...draft.rate, [def.key]: e.target.value })}
                  />
                )}
              </Field>
            ))}
          </div>
          {errors["scaling.rate"] && (
            <p className="mt-2 text-xs font-medium text-danger" role="alert">
              {errors["scaling.rate"]}
            </p>
          )}
        </fieldset>
      ) : (
        <ReturnPeriodTablesEditor value={draft} onChange={(part) => onChange({ ...draft, ...part })} errors={errors} readOnly={readOnly} />
      )}
      <Field
        label="Source"
        hint="Where the scaling comes from (publication, table or figure) and how sure it is, or “illustrative”."
        error={errors.source}
      >
        {(a) => <Textarea {...a} {...text("source")} />}
      </Field>
    </div>
  );
}
