import type { PerilProfileRecord, PortfolioSummary } from "@plumeline/contracts";
import { Select } from "@/components/ui/field";

/** What a run takes from the peril lens (the POST /api/runs fields). */
export interface PerilRunChoice {
  perilProfileIds: string[];
  portfolioId: string | null;
}

/**
 * Peril profiles and a portfolio for a new run, from plain lists. A portfolio needs at least
 * one profile (the server refuses it otherwise), so its choice opens once a profile is ticked.
 */
export function PerilRunPicker({
  profiles,
  portfolios,
  value,
  onChange,
}: {
  profiles: Array<Pick<PerilProfileRecord, "id" | "name" | "peril" | "region" | "metric">>;
  portfolios: Array<Pick<PortfolioSummary, "id" | "name" | "rowCount">>;
  value: PerilRunChoice;
  onChange: (next: PerilRunChoice) => void;
}) {
  const toggle = (id: string) => {
    const ids = value.perilProfileIds.includes(id) ? value.perilProfileIds.filter((x) => x !== id) : [...value.perilProfileIds, id];
    onChange({ perilProfileIds: ids, portfolioId: ids.length === 0 ? null : value.portfolioId });
  };
  return (
    <fieldset className="flex flex-col gap-3 rounded-md border border-line p-3">
      <legend className="px-1 text-sm font-medium text-ink">Peril lens (optional)</legend>
      {profiles.length === 0 ? (
        <p className="text-sm text-muted">No peril profiles yet.</p>
      ) : (
        <div role="group" aria-label="Peril profiles" className="flex flex-col gap-1">
          {profiles.map((p) => (
            <label key={p.id} className="flex items-center gap-2 text-sm">
              <input type="checkbox" checked={value.perilProfileIds.includes(p.id)} onChange={() => toggle(p.id)} />
              <span className="font-medium">{p.name}</span>
              <span className="text-xs text-muted">
                {p.peril} · {p.region} · {p.metric}
              </span>
            </label>
          ))}
        </div>
      )}
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-medium text-ink">Portfolio baseline</span>
        <Select
          aria-label="Portfolio baseline"
          value={value.portfolioId ?? ""}
          disabled={value.perilProfileIds.length === 0}
          onChange={(e) => onChange({ ...value, portfolioId: e.target.value || null })}
        >
          <option value="">None (multipliers and return periods only)</option>
          {portfolios.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name} ({p.rowCount} rows)
            </option>
          ))}
        </Select>
        {value.perilProfileIds.length === 0 && <span className="text-xs text-muted">Tick a profile first: a portfolio is projected by its profiles.</span>}
      </label>
    </fieldset>
  );
}
