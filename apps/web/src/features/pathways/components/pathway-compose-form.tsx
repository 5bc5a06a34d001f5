import { useMemo, useState } from "react";
import { createPathwayBodySchema, formatIssues, type Pathway } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Field, Textarea } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { useCreatePathway } from "../api/create-pathway";
import { PathwayCharts } from "./pathway-charts";

/**
 * Compose a pathway from JSON (typically an existing pathway's, edited): checked live with
 * the same schema the API uses, each problem named by its path, and previewed as a chart.
 */
export function PathwayComposeForm({ initialJson, onSaved }: { initialJson: string; onSaved: (p: Pathway) => void }) {
  const [text, setText] = useState(initialJson);
  const create = useCreatePathway();
  const check = useMemo(() => {
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch (e) {
      return { ok: false as const, problems: [`Not valid JSON: ${(e as Error).message}`] };
    }
    const parsed = createPathwayBodySchema.safeParse(json);
    if (!parsed.success) return { ok: false as const, problems: formatIssues(parsed.error) };
    const lengths = Object.values(parsed.data.agents).map((s) => Object.values(s ?? {})[0]?.length ?? 0);
    if (lengths.length === 0) return { ok: false as const, problems: ["agents must hold at least one agent"] };
    if (new Set(lengths).size > 1) return { ok: false as const, problems: [`agents must all have the same number of years (found ${[...new Set(lengths)].join(", ")})`] };
    return { ok: true as const, body: parsed.data };
  }, [text]);

  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,1.2fr)]">
      <div className="flex flex-col gap-3">
        <Field label="Pathway JSON" hint="Fields: name, description, source, vintage, startYear, agents (engine series: { erf: […] } or ppm/ppb for CO2, CH4, N2O).">
          {(p) => <Textarea {...p} value={text} onChange={(e) => setText(e.target.value)} spellCheck={false} className="num min-h-[28rem] text-xs" />}
        </Field>
        {!check.ok && (
          <div role="alert" className="rounded-md border border-danger/40 bg-danger-soft px-3 py-2 text-sm">
            <p className="font-semibold text-danger">Fix before saving</p>
            <ul className="mt-1 list-disc pl-5">
              {check.problems.slice(0, 15).map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          </div>
        )}
        {create.error && <ErrorState error={create.error} />}
        <div>
          <Button disabled={!check.ok || create.isPending} onClick={() => check.ok && create.mutate(check.body, { onSuccess: onSaved })}>
            {create.isPending ? "Saving…" : "Save as new pathway"}
          </Button>
        </div>
      </div>
      <div className="min-w-0">
        {check.ok ? (
          <PathwayCharts name={check.body.name} startYear={check.body.startYear} agents={check.body.agents} />
        ) : (
          <p className="text-sm text-muted">The preview appears once the JSON is valid.</p>
        )}
      </div>
    </div>
  );
}
