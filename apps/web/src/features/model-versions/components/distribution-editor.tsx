import { useMemo, useState } from "react";
import { distributionSchema, RANGE_SHAPE_LABELS, type Distribution, type DistributionType } from "@plumeline/contracts";
import { DensityPreview } from "@/components/charts/density-preview";
import { Input, Select } from "@/components/ui/field";
import { cx } from "@/components/ui/cx";
import { densityCurve } from "@plumeline/engine";
import { percentileValues } from "../lib/preview-percentiles";
import { convertDistribution, DISTRIBUTION_FIELDS, DISTRIBUTION_TYPE_LABELS } from "../lib/distribution-fields";
import { PRESETS } from "../lib/presets";

type Draft = Record<string, string>;

function toDraft(d: Distribution): Draft {
  const out: Draft = {};
  for (const [k, v] of Object.entries(d)) if (k !== "type") out[k] = String(v);
  return out;
}

function fromDraft(type: DistributionType, draft: Draft): Record<string, unknown> {
  const out: Record<string, unknown> = { type };
  for (const f of DISTRIBUTION_FIELDS[type]) out[f.key] = draft[f.key]?.trim() === "" ? Number.NaN : Number(draft[f.key]);
  if (type === "range") {
    out.coverage = Number(draft.coverage ?? 90);
    out.shape = draft.shape ?? "lognormal";
  }
  return out;
}

/**
 * Editor for one uncertain input: type, its parameters (messages beside each), presets of
 * assessed ranges where we have them, and a live density with its 5/17/50/83/95 values,
 * computed in the browser as the user types.
 */
export function DistributionEditor({
  id,
  label,
  unit,
  value,
  onChange,
  readOnly = false,
}: {
  id: string;
  label: string;
  unit: string;
  value: Distribution;
  onChange: (d: Distribution | null) => void;
  readOnly?: boolean;
}) {
  const [type, setType] = useState<DistributionType>(value.type);
  const [draft, setDraft] = useState<Draft>(() => toDraft(value));
  const candidate = useMemo(() => fromDraft(type, draft), [type, draft]);
  const parsed = useMemo(() => distributionSchema.safeParse(candidate), [candidate]);
  const [lastValid, setLastValid] = useState<Distribution>(value);
  const valid = parsed.success ? parsed.data : null;
  const shown = valid ?? lastValid;
  const errors: Record<string, string> = {};
  if (!parsed.success) for (const i of parsed.error.issues) errors[String(i.path[0] ?? "type")] ??= i.message;

  const preview = useMemo(() => ({ curve: densityCurve(shown), values: percentileValues(shown) }), [shown]);

  function update(nextType: DistributionType, nextDraft: Draft) {
    setType(nextType);
    setDraft(nextDraft);
    const p = distributionSchema.safeParse(fromDraft(nextType, nextDraft));
    if (p.success) setLastValid(p.data);
    onChange(p.success ? p.data : null);
  }

  function changeType(t: DistributionType) {
    const converted = convertDistribution(shown, t);
    update(t, toDraft(converted));
  }

  const presets = PRESETS[id] ?? [];
  return (
    <div className={cx("grid gap-4 rounded-md border bg-surface p-3 md:grid-cols-[minmax(0,1fr)_18rem]", valid ? "border-line" : "border-danger/60")} data-input={id} role="group" aria-label={label}>
      <div className="flex min-w-0 flex-col gap-2">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h4 className="text-sm font-semibold text-ink">
            {label} <span className="font-normal text-muted">({unit})</span>
          </h4>
          <label className="flex items-center gap-2 text-xs text-muted">
            <span>Shape</span>
            <Select aria-label={`${label}: distribution type`} value={type} disabled={readOnly} onChange={(e) => changeType(e.target.value as DistributionType)} className="w-auto py-1 text-xs">
              {(Object.keys(DISTRIBUTION_TYPE_LABELS) as DistributionType[]).map((t) => (
                <option key={t} value={t}>
                  {DISTRIBUTION_TYPE_LABELS[t]}
                </option>
              ))}
            </Select>
          </label>
        </div>
        <div className="flex flex-wrap gap-3">
          {DISTRIBUTION_FIELDS[type].map((f) => {
            const inputId = `${id}-${f.key}`;
            return (
              <div key={f.key} className="flex w-28 flex-col gap-0.5">
                <label htmlFor={inputId} className="text-xs text-muted">
                  {f.label}
                </label>
                <Input
                  id={inputId}
                  inputMode="decimal"
                  className="num py-1"
                  value={draft[f.key] ?? ""}
                  disabled={readOnly}
                  aria-invalid={errors[f.key] ? true : undefined}
                  aria-describedby={errors[f.key] ? `${inputId}-error` : undefined}
                  onChange={(e) => update(type, { ...draft, [f.key]: e.target.value })}
                />
                {errors[f.key] && (
                  <span id={`${inputId}-error`} role="alert" className="text-[11px] font-medium text-danger">
                    {errors[f.key]}
                  </span>
                )}
              </div>
            );
          })}
          {type === "range" && (
            <>
              <div className="flex w-36 flex-col gap-0.5">
                <label htmlFor={`${id}-coverage`} className="text-xs text-muted">
                  Range covers
                </label>
                <Select id={`${id}-coverage`} value={draft.coverage ?? "90"} disabled={readOnly} className="py-1 text-xs" onChange={(e) => update(type, { ...draft, coverage: e.target.value })}>
                  <option value="90">90 % (5–95)</option>
                  <option value="66">66 % (17–83)</option>
                </Select>
              </div>
              <div className="flex w-52 flex-col gap-0.5">
                <label htmlFor={`${id}-shape`} className="text-xs text-muted">
                  Fitted as
                </label>
                <Select id={`${id}-shape`} value={draft.shape ?? "lognormal"} disabled={readOnly} className="py-1 text-xs" onChange={(e) => update(type, { ...draft, shape: e.target.value })}>
                  <option value="lognormal">{RANGE_SHAPE_LABELS.lognormal}</option>
                  <option value="split-normal">{RANGE_SHAPE_LABELS["split-normal"]}</option>
                </Select>
                {errors.shape && <span className="text-[11px] text-danger">{errors.shape}</span>}
              </div>
            </>
          )}
        </div>
        {presets.length > 0 && !readOnly && (
          <div className="flex flex-wrap items-center gap-1.5 text-xs">
            <span className="text-muted">Assessed ranges:</span>
            {presets.map((p) => (
              <button key={p.label} type="button" title={p.source} className="rounded-full border border-line px-2 py-0.5 hover:bg-accent-soft" onClick={() => update(p.value.type, toDraft(p.value))}>
                {p.label}
              </button>
            ))}
          </div>
        )}
        <table className="mt-auto w-full max-w-md text-xs" aria-label={`${label}: percentiles of the distribution`}>
          <thead>
            <tr className="text-muted">
              {preview.values.map((v) => (
                <th key={v.p} className="px-1 text-right font-normal">
                  {v.p} %
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            <tr>
              {preview.values.map((v) => (
                <td key={v.p} className={cx("num px-1 text-right", v.p === 50 && "font-semibold text-ink")}>
                  {Math.abs(v.value) >= 100 ? v.value.toFixed(1) : v.value.toFixed(3)}
                </td>
              ))}
            </tr>
          </tbody>
        </table>
        {!valid && <p className="text-[11px] text-muted">Preview shows the last valid values.</p>}
      </div>
      <div className="min-w-0">
        {shown.type === "fixed" ? (
          <div className="flex h-24 items-center justify-center rounded bg-surface-2 text-xs text-muted">Fixed at {shown.value} {unit}: no spread</div>
        ) : (
          <DensityPreview xs={preview.curve.x} density={preview.curve.density} markers={preview.values} unit={unit} label={label} width={288} />
        )}
      </div>
    </div>
  );
}
