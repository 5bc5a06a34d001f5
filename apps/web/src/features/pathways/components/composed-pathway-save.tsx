import { useState } from "react";
import {
  createPathwayBodySchema,
  formatPath,
  type CreatePathwayBody,
  type Pathway,
  type PathwayData,
  type PathwayRecipe,
} from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Field, Input, Textarea } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { ApiError, isApiError } from "@/lib/api-error";
import { useCreatePathway } from "../api/create-pathway";
import { nameSeriesYear } from "../lib/series-error-paths";

export interface ComposedMetadata {
  name: string;
  source: string;
  vintage: string;
  description: string;
}

/** The description saved with the pathway: the author's words, then the recipe in plain words. */
export const savedDescription = (own: string, recipeText: string) => [own.trim(), recipeText].filter(Boolean).join("\n\n");

/**
 * Names, source and vintage for the composed pathway, then Save. The body is checked with the
 * very schema the API applies to an upload or a typed pathway, and goes to the same endpoint
 * and service; the server replays the recipe and refuses numbers it does not reproduce. Every
 * problem, the client's or the server's, names its field and, for a value, its year.
 */
export function ComposedPathwaySave({
  initial,
  composed,
  recipe,
  recipeText,
  onSaved,
}: {
  initial: ComposedMetadata;
  composed: PathwayData | undefined;
  recipe: PathwayRecipe;
  recipeText: string;
  onSaved: (p: Pathway) => void;
}) {
  const [meta, setMeta] = useState(initial);
  const [tried, setTried] = useState(false);
  const create = useCreatePathway();
  const body: CreatePathwayBody | null = composed
    ? {
        name: meta.name,
        source: meta.source,
        vintage: meta.vintage,
        description: savedDescription(meta.description, recipeText),
        startYear: composed.startYear,
        agents: composed.agents,
        recipe,
      }
    : null;
  const check = body ? createPathwayBodySchema.safeParse(body) : null;
  const problems =
    check && !check.success
      ? check.error.issues.map((i) => ({ path: nameSeriesYear(formatPath(i.path), body?.startYear ?? 0), message: i.message }))
      : [];
  const fieldError = (field: keyof ComposedMetadata) => {
    const message = tried ? problems.find((p) => p.path === field)?.message : undefined;
    // The recipe shares the description's room: say so, or "at most 2000 characters" reads as the author's fault alone.
    return message && field === "description"
      ? `${message} — the recipe alone takes ${recipeText.length}; shorten the description or use fewer steps`
      : message;
  };
  const serverError = isApiError(create.error)
    ? new ApiError(
        create.error.status,
        create.error.code,
        create.error.message,
        create.error.details.map((d) => ({ ...d, path: nameSeriesYear(d.path, body?.startYear ?? 0) })),
      )
    : create.error;

  function save() {
    setTried(true);
    if (!check?.success) return;
    create.mutate(check.data, { onSuccess: onSaved });
  }

  const set = (field: keyof ComposedMetadata) => (e: { target: { value: string } }) => setMeta((m) => ({ ...m, [field]: e.target.value }));
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 lg:grid-cols-2">
        <Field label="Name" error={fieldError("name")}>
          {(p) => <Input {...p} value={meta.name} onChange={set("name")} maxLength={120} />}
        </Field>
        <Field label="Vintage" error={fieldError("vintage")} hint="Release or edition of the numbers it started from.">
          {(p) => <Input {...p} value={meta.vintage} onChange={set("vintage")} maxLength={120} />}
        </Field>
        <Field
          label="Source"
          error={fieldError("source")}
          hint="Where the numbers came from; the recipe below says how they were changed."
          className="lg:col-span-2"
        >
          {(p) => <Input {...p} value={meta.source} onChange={set("source")} maxLength={500} />}
        </Field>
        <Field label="Description (optional)" error={fieldError("description")} className="lg:col-span-2">
          {(p) => <Textarea {...p} value={meta.description} onChange={set("description")} rows={2} />}
        </Field>
      </div>
      <div className="rounded-md border border-line bg-surface-2/60 px-3 py-2 text-sm">
        <p className="font-medium text-ink">Recipe saved with the pathway (added to its description)</p>
        <p className="mt-1 text-muted">{recipeText}</p>
      </div>
      {tried && problems.length > 0 && (
        <div role="alert" className="rounded-md border border-danger/40 bg-danger-soft px-3 py-2 text-sm">
          <p className="font-semibold text-danger">Fix before saving</p>
          <ul className="mt-1 list-disc pl-5">
            {problems.slice(0, 15).map((p, i) => (
              <li key={i}>
                <code className="font-mono text-xs">{p.path}</code> {p.message}
              </li>
            ))}
          </ul>
        </div>
      )}
      {serverError && <ErrorState title="The server did not save the pathway" error={serverError} />}
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={save} disabled={!composed || create.isPending}>
          {create.isPending ? "Saving…" : "Save as new pathway"}
        </Button>
        {!composed && <p className="text-sm text-muted">Every step must apply before the pathway can be saved.</p>}
      </div>
    </div>
  );
}
