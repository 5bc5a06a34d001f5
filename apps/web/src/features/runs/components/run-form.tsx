import { useMemo, useState, type SubmitEvent, type ReactNode } from "react";
import { createRunBodySchema, type CreateRunBody, type ModelVersionStatus, type RunSummary } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { ExploratoryStamp } from "@/components/ui/badges";
import { Field, Input } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import type { PickerSource } from "@/components/search-picker/picker-source";
import { SearchMultiPicker } from "@/components/search-picker/search-multi-picker";
import { SearchPicker } from "@/components/search-picker/search-picker";
import { isApiError } from "@/lib/api-error";
import { useCreateRun } from "../api/create-run";
import { parseNumbers } from "@/lib/parse-numbers";

export interface VersionOption {
  id: string;
  name: string;
  versionNumber: number;
  status: ModelVersionStatus;
  defaults?: { horizons: number[]; thresholds: number[] };
}

export interface PathwayOption {
  id: string;
  name: string;
  startYear: number;
  endYear: number;
  vintage: string;
}

/** A rejected or retired version stays listed (so no one wonders where it went) but cannot be run. */
const notRunnable = (v: VersionOption) => v.status === "rejected" || v.status === "retired";

type FieldName = "name" | "modelVersionId" | "pathwayIds" | "members" | "seed" | "sampling" | "horizons" | "thresholds";

const randomSeed = () => `seed-${Math.random().toString(36).slice(2, 8)}`;

/**
 * The run form. Checks the body with the same zod schema the API validates with and puts
 * each message beside its field; the server's own 400 details land in the same places.
 */
export function RunForm({
  versionSource,
  pathwaySource,
  initialVersion,
  onCreated,
  lens,
  lensFields,
}: {
  /** Where the model-version picker searches (the model-versions feature's list, given by the app layer). */
  versionSource: PickerSource<VersionOption>;
  /** Where the pathway picker searches (the pathways feature's list, given by the app layer). */
  pathwaySource: PickerSource<PathwayOption>;
  /** The version chosen when the form opens (the one a link named, or the newest approved). */
  initialVersion?: VersionOption | undefined;
  onCreated: (run: RunSummary) => void;
  /** Peril lens choices (perilProfileIds, portfolioId) and the fields that make them, composed by the app layer. */
  lens?: Pick<CreateRunBody, "perilProfileIds" | "portfolioId">;
  lensFields?: ReactNode;
}) {
  const createRun = useCreateRun();
  const [version, setVersion] = useState<VersionOption | undefined>(
    initialVersion && !notRunnable(initialVersion) ? initialVersion : undefined,
  );
  const versionId = version?.id ?? "";
  const [selected, setSelected] = useState<string[]>([]);
  const [sampling, setSampling] = useState<"latin-hypercube" | "monte-carlo">("latin-hypercube");
  const [errors, setErrors] = useState<Partial<Record<FieldName, string>>>({});
  const [seed] = useState(randomSeed);
  const defaults = useMemo(() => version?.defaults ?? { horizons: [2030, 2050, 2100], thresholds: [1.5, 2, 3] }, [version]);

  function submit(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const next: Partial<Record<FieldName, string>> = {};
    const horizons = parseNumbers(formText(form, "horizons"));
    const thresholds = parseNumbers(formText(form, "thresholds"));
    if ("bad" in horizons) next.horizons = `"${horizons.bad}" is not a year; list years separated by commas`;
    if ("bad" in thresholds) next.thresholds = `"${thresholds.bad}" is not a number; list warming levels in K separated by commas`;
    const membersText = formText(form, "members").trim();
    const body: CreateRunBody = {
      name: formText(form, "name").trim() || undefined,
      modelVersionId: versionId,
      pathwayIds: selected,
      members: membersText === "" ? Number.NaN : Number(membersText),
      seed: formText(form, "seed"),
      sampling,
      horizons: "values" in horizons && horizons.values.length ? horizons.values : undefined,
      thresholds: "values" in thresholds && thresholds.values.length ? thresholds.values : undefined,
      ...lens,
    };
    const parsed = createRunBodySchema.safeParse(body);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const key = String(issue.path[0]) as FieldName;
        next[key] ??= key === "members" && Number.isNaN(body.members) ? "Enter the number of members" : issue.message;
      }
    }
    setErrors(next);
    if (Object.keys(next).length > 0 || !parsed.success) return;
    createRun.mutate(parsed.data, {
      onSuccess: onCreated,
      onError: (err) => {
        if (isApiError(err) && err.status === 400) {
          const fromServer: Partial<Record<FieldName, string>> = {};
          for (const d of err.details) fromServer[d.path.split(/[.[]/)[0] as FieldName] ??= d.message;
          setErrors(fromServer);
        }
      },
    });
  }

  return (
    <form noValidate onSubmit={submit} className="grid gap-5 lg:grid-cols-2">
      <Field label="Name (optional)" error={errors.name} hint="How the run is listed, e.g. “Q3 ORSA – three pathways”.">
        {(p) => <Input {...p} name="name" maxLength={120} />}
      </Field>
      <SearchPicker<VersionOption>
        label="Model version"
        error={errors.modelVersionId}
        hint="Approved versions give filing-grade results; any other version makes the run exploratory."
        source={versionSource}
        itemLabel={(v) => `${v.name} v${v.versionNumber}`}
        itemDetail={(v) => (notRunnable(v) ? `${v.status} — cannot be run` : v.status)}
        isDisabled={notRunnable}
        value={versionId}
        selected={version}
        onChange={(_, v) => setVersion(v)}
        placeholder="Type part of a version's name…"
      />
      {version && version.status !== "approved" && (
        <div className="flex items-center gap-3 rounded-md border border-ember-400 bg-ember-50 px-3 py-2 text-sm text-ember-800 lg:col-span-2">
          <ExploratoryStamp size="sm" /> This version is <strong>{version.status}</strong>: the result will be exploratory and not for
          filing.
        </div>
      )}
      <SearchMultiPicker<PathwayOption>
        className="lg:col-span-2"
        label="Pathways"
        error={errors.pathwayIds && `Pathways ${errors.pathwayIds}`}
        source={pathwaySource}
        itemLabel={(p) => p.name}
        itemDetail={(p) => `${p.startYear}–${p.endYear} · ${p.vintage}`}
        value={selected}
        onChange={setSelected}
        placeholder="Type part of a pathway's name, choose to add…"
        noneChosen="None chosen yet: each pathway chosen is run with the same members."
      />
      <Field label="Members" error={errors.members} hint="Ensemble size; 5,000–20,000 is usual. Up to 2,000,000.">
        {(p) => <Input {...p} name="members" inputMode="numeric" defaultValue="5000" className="num" />}
      </Field>
      <Field label="Seed" error={errors.seed} hint="Recorded with the run; same seed, same numbers.">
        {(p) => <Input {...p} name="seed" defaultValue={seed} className="num" />}
      </Field>
      <fieldset>
        <legend className="mb-1 text-sm font-medium text-ink">Sampling</legend>
        <div className="flex gap-4 text-sm">
          {(
            [
              ["latin-hypercube", "Latin hypercube"],
              ["monte-carlo", "Plain Monte Carlo"],
            ] as const
          ).map(([value, label]) => (
            <label key={value} className="flex items-center gap-1.5">
              <input
                type="radio"
                name="sampling"
                value={value}
                checked={sampling === value}
                onChange={() => setSampling(value)}
                className="accent-[var(--pl-accent)]"
              />
              {label}
            </label>
          ))}
        </div>
        {errors.sampling && <p className="text-xs text-danger">{errors.sampling}</p>}
      </fieldset>
      <div className="grid grid-cols-2 gap-4">
        <Field label="Horizons (years)" error={errors.horizons}>
          {(p) => <Input {...p} key={`h-${versionId}`} name="horizons" defaultValue={defaults.horizons.join(", ")} className="num" />}
        </Field>
        <Field label="Thresholds (K)" error={errors.thresholds}>
          {(p) => <Input {...p} key={`t-${versionId}`} name="thresholds" defaultValue={defaults.thresholds.join(", ")} className="num" />}
        </Field>
      </div>
      {lensFields && <div className="lg:col-span-2">{lensFields}</div>}
      {createRun.error && !(isApiError(createRun.error) && createRun.error.status === 400) && (
        <div className="lg:col-span-2">
          <ErrorState error={createRun.error} />
        </div>
      )}
      <div className="lg:col-span-2">
        <Button type="submit" disabled={createRun.isPending}>
          {createRun.isPending ? "Queuing…" : "Queue run"}
        </Button>
      </div>
    </form>
  );
}

/** A text field of the submitted form ("" when missing; the form has no file inputs). */
function formText(form: FormData, name: string): string {
  const value = form.get(name);
  return typeof value === "string" ? value : "";
}
