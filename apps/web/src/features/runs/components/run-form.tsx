import { useMemo, useState, type SubmitEvent, type ReactNode } from "react";
import { createRunBodySchema, type CreateRunBody, type ModelVersionStatus, type RunSummary } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { ExploratoryStamp } from "@/components/ui/badges";
import { Field, Input, Select } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
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

type FieldName = "name" | "modelVersionId" | "pathwayIds" | "members" | "seed" | "sampling" | "horizons" | "thresholds";

const randomSeed = () => `seed-${Math.random().toString(36).slice(2, 8)}`;

/**
 * The run form. Checks the body with the same zod schema the API validates with and puts
 * each message beside its field; the server's own 400 details land in the same places.
 */
export function RunForm({
  versions,
  pathways,
  initialVersionId,
  onCreated,
  lens,
  lensFields,
}: {
  versions: VersionOption[];
  pathways: PathwayOption[];
  initialVersionId?: string;
  onCreated: (run: RunSummary) => void;
  /** Peril lens choices (perilProfileIds, portfolioId) and the fields that make them, composed by the app layer. */
  lens?: Pick<CreateRunBody, "perilProfileIds" | "portfolioId">;
  lensFields?: ReactNode;
}) {
  const createRun = useCreateRun();
  const [versionId, setVersionId] = useState(initialVersionId ?? versions.find((v) => v.status === "approved")?.id ?? versions[0]?.id ?? "");
  const [selected, setSelected] = useState<string[]>([]);
  const [sampling, setSampling] = useState<"latin-hypercube" | "monte-carlo">("latin-hypercube");
  const [errors, setErrors] = useState<Partial<Record<FieldName, string>>>({});
  const version = versions.find((v) => v.id === versionId);
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
      <Field label="Model version" error={errors.modelVersionId} hint="Approved versions give filing-grade results; any other version makes the run exploratory.">
        {(p) => (
          <Select {...p} value={versionId} onChange={(e) => setVersionId(e.target.value)}>
            {versions.map((v) => (
              <option key={v.id} value={v.id}>
                {v.name} v{v.versionNumber} — {v.status}
              </option>
            ))}
          </Select>
        )}
      </Field>
      {version && version.status !== "approved" && (
        <div className="flex items-center gap-3 rounded-md border border-ember-400 bg-ember-50 px-3 py-2 text-sm text-ember-800 lg:col-span-2">
          <ExploratoryStamp size="sm" /> This version is <strong>{version.status}</strong>: the result will be exploratory and not for filing.
        </div>
      )}
      <fieldset className="lg:col-span-2" aria-describedby={errors.pathwayIds ? "pathways-error" : undefined}>
        <legend className="mb-1 text-sm font-medium text-ink">Pathways</legend>
        <div className="grid gap-2 sm:grid-cols-2 xl:grid-cols-3">
          {pathways.map((p) => (
            <label key={p.id} className="flex cursor-pointer items-start gap-2 rounded-md border border-line bg-surface px-3 py-2 text-sm has-checked:border-accent has-checked:bg-accent-soft">
              <input
                type="checkbox"
                className="mt-0.5 accent-[var(--pl-accent)]"
                checked={selected.includes(p.id)}
                onChange={(e) => setSelected((s) => (e.target.checked ? [...s, p.id] : s.filter((x) => x !== p.id)))}
              />
              <span>
                <span className="font-medium">{p.name}</span>
                <span className="block text-xs text-muted">
                  {p.startYear}–{p.endYear} · {p.vintage}
                </span>
              </span>
            </label>
          ))}
        </div>
        {errors.pathwayIds && (
          <p id="pathways-error" role="alert" className="mt-1 text-xs font-medium text-danger">
            Pathways {errors.pathwayIds}
          </p>
        )}
      </fieldset>
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
              <input type="radio" name="sampling" value={value} checked={sampling === value} onChange={() => setSampling(value)} className="accent-[var(--pl-accent)]" />
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
