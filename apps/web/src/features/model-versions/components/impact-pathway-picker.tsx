import { useState } from "react";
import { Button } from "@/components/ui/button";

export interface PathwayOption {
  id: string;
  name: string;
}

/**
 * Which pinned pathways the preview runs on: all by default. Ticking boxes changes nothing until
 * "Preview on these" is pressed, because every preview costs seconds of server CPU.
 */
export function ImpactPathwayPicker({ options, chosen, onApply }: { options: PathwayOption[]; chosen: string[]; onApply: (ids: string[]) => void }) {
  const [draft, setDraft] = useState<string[]>(chosen);
  const toggle = (id: string) => setDraft((d) => (d.includes(id) ? d.filter((x) => x !== id) : options.map((o) => o.id).filter((x) => x === id || d.includes(x))));
  const unchanged = draft.length === chosen.length && draft.every((id) => chosen.includes(id));
  return (
    <fieldset className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
      <legend className="mb-1 text-sm font-medium text-ink">Pathways previewed (pinned by the version)</legend>
      {options.map((o) => (
        <label key={o.id} className="flex items-center gap-1.5">
          <input type="checkbox" checked={draft.includes(o.id)} onChange={() => toggle(o.id)} className="accent-[var(--pl-accent)]" />
          {o.name}
        </label>
      ))}
      <Button variant="secondary" size="sm" disabled={draft.length === 0 || unchanged} onClick={() => onApply(draft)}>
        Preview on these
      </Button>
      {draft.length === 0 && <span className="text-xs text-danger">Pick at least one pathway.</span>}
    </fieldset>
  );
}
