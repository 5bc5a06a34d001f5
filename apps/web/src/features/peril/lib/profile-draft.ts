import type { Distribution, PerilProfileBody, PerilProfileRecord } from "@plumeline/contracts";

/**
 * The profile editor's state: text as typed (so a half-typed number is not lost), rates in
 * % per K as practitioners quote them (7 rather than 0.07). `toProfileBody` turns it into the
 * API body (rates as fractions) or says which field is not a number yet; everything else is
 * validated by the server, whose messages the editor places beside the fields.
 */
export type RateType = Distribution["type"];

export interface ProfileDraft {
  name: string;
  peril: string;
  region: string;
  metric: "frequency" | "severity";
  baselineWarming: string;
  source: string;
  kind: "per-kelvin" | "table";
  rateType: RateType;
  /** Parameter text by name; rate-valued ones in % per K. */
  rate: Record<string, string>;
  coverage: "90" | "66";
  shape: "lognormal" | "split-normal";
  /** One table per event return period (years), each with its points as typed. */
  tables: DraftTable[];
  beyondTable: "hold" | "extrapolate";
  beyondReturnPeriods: "hold" | "extrapolate";
}

export interface DraftTable {
  returnPeriod: string;
  points: Array<{ warming: string; multiplier: string }>;
}

interface ParamDef {
  key: string;
  label: string;
  /** True when the parameter is a rate (shown in % per K, stored as a fraction). */
  percent: boolean;
}

/** The parameters each rate distribution takes, in the order the editor shows them. */
export const RATE_PARAMS: Record<RateType, ParamDef[]> = {
  fixed: [{ key: "value", label: "Rate (% per K)", percent: true }],
  normal: [
    { key: "mean", label: "Mean (% per K)", percent: true },
    { key: "sd", label: "Standard deviation (% per K)", percent: true },
  ],
  lognormal: [
    { key: "median", label: "Median (% per K)", percent: true },
    { key: "logSd", label: "Log standard deviation", percent: false },
  ],
  uniform: [
    { key: "min", label: "Lowest (% per K)", percent: true },
    { key: "max", label: "Highest (% per K)", percent: true },
  ],
  triangular: [
    { key: "min", label: "Lowest (% per K)", percent: true },
    { key: "mode", label: "Mode (% per K)", percent: true },
    { key: "max", label: "Highest (% per K)", percent: true },
  ],
  "truncated-normal": [
    { key: "mean", label: "Mean (% per K)", percent: true },
    { key: "sd", label: "Standard deviation (% per K)", percent: true },
    { key: "min", label: "Lower bound (% per K)", percent: true },
    { key: "max", label: "Upper bound (% per K)", percent: true },
  ],
  range: [
    { key: "p50", label: "Median (% per K)", percent: true },
    { key: "low", label: "Low end of range (% per K)", percent: true },
    { key: "high", label: "High end of range (% per K)", percent: true },
  ],
};

export const RATE_TYPE_LABELS: Record<RateType, string> = {
  range: "From a range (median and 5–95 % or 17–83 %)",
  fixed: "Fixed",
  normal: "Normal",
  "truncated-normal": "Truncated normal",
  lognormal: "Lognormal",
  uniform: "Uniform",
  triangular: "Triangular",
};

/** 0.07 -> "7" without binary noise (0.07 × 100 = 7.000000000000001). */
const toPercentText = (v: number) => String(Number((v * 100).toPrecision(12)));
const fromPercent = (v: number) => Number((v / 100).toPrecision(15));

export function emptyDraft(): ProfileDraft {
  return {
    name: "",
    peril: "flood-heavy-rainfall",
    region: "",
    metric: "severity",
    baselineWarming: "1.1",
    source: "",
    kind: "per-kelvin",
    rateType: "range",
    rate: { p50: "7", low: "5", high: "9" },
    coverage: "90",
    shape: "split-normal",
    tables: [
      {
        returnPeriod: "10",
        points: [
          { warming: "1", multiplier: "1" },
          { warming: "2", multiplier: "2" },
        ],
      },
    ],
    beyondTable: "hold",
    beyondReturnPeriods: "hold",
  };
}

export function draftFromRecord(p: Pick<PerilProfileRecord, "name" | "peril" | "region" | "metric" | "baselineWarming" | "source" | "scaling">): ProfileDraft {
  const draft: ProfileDraft = { ...emptyDraft(), name: p.name, peril: p.peril, region: p.region, metric: p.metric, baselineWarming: String(p.baselineWarming), source: p.source ?? "" };
  if (p.scaling.kind === "table") {
    draft.kind = "table";
    draft.tables = p.scaling.tables.map((t) => ({
      returnPeriod: String(t.returnPeriod),
      points: t.points.map((pt) => ({ warming: String(pt.warming), multiplier: String(pt.multiplier) })),
    }));
    draft.beyondTable = p.scaling.beyondTable;
    draft.beyondReturnPeriods = p.scaling.beyondReturnPeriods;
    return draft;
  }
  const rate = p.scaling.rate as Distribution & Record<string, unknown>;
  draft.kind = "per-kelvin";
  draft.rateType = rate.type;
  draft.rate = Object.fromEntries(RATE_PARAMS[rate.type].map((d) => [d.key, d.percent ? toPercentText(rate[d.key] as number) : String(rate[d.key])]));
  if (rate.type === "range") {
    draft.coverage = String(rate.coverage) as "90" | "66";
    draft.shape = rate.shape;
  }
  return draft;
}

function readNumber(text: string): number | null {
  const t = text.trim();
  if (t === "" || !/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) return null;
  return Number(t);
}

/** The API body of a draft, or the fields (API paths) whose text is not a number. */
export function toProfileBody(d: ProfileDraft): { body: PerilProfileBody; errors: null } | { body: null; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const num = (text: string, path: string) => {
    const v = readNumber(text);
    if (v === null) errors[path] = "must be a number";
    return v ?? 0;
  };
  const baselineWarming = num(d.baselineWarming, "baselineWarming");
  let scaling: PerilProfileBody["scaling"];
  if (d.kind === "table") {
    scaling = {
      kind: "table",
      tables: d.tables.map((t, k) => ({
        returnPeriod: num(t.returnPeriod, `scaling.tables[${k}].returnPeriod`),
        points: t.points.map((p, i) => ({
          warming: num(p.warming, `scaling.tables[${k}].points[${i}].warming`),
          multiplier: num(p.multiplier, `scaling.tables[${k}].points[${i}].multiplier`),
        })),
      })),
      beyondTable: d.beyondTable,
      beyondReturnPeriods: d.beyondReturnPeriods,
    };
  } else {
    const params = Object.fromEntries(
      RATE_PARAMS[d.rateType].map((def) => {
        const v = num(d.rate[def.key] ?? "", `scaling.rate.${def.key}`);
        return [def.key, def.percent ? fromPercent(v) : v];
      }),
    );
    const extra = d.rateType === "range" ? { coverage: Number(d.coverage), shape: d.shape } : {};
    scaling = { kind: "per-kelvin", rate: { type: d.rateType, ...params, ...extra } as Distribution };
  }
  if (Object.keys(errors).length > 0) return { body: null, errors };
  const body: PerilProfileBody = { name: d.name, peril: d.peril, region: d.region, metric: d.metric, baselineWarming, scaling };
  if (d.source.trim() !== "") body.source = d.source;
  return { body, errors: null };
}
