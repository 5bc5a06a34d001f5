import type { PerilProfileRecord, PortfolioSummary } from "@plumeline/contracts";
import type { PickerSource } from "@/components/search-picker/picker-source";
import { SearchMultiPicker } from "@/components/search-picker/search-multi-picker";
import { Select } from "@/components/ui/field";

type ProfileOption = Pick<PerilProfileRecord, "id" | "name" | "peril" | "region" | "metric">;

/** What a run takes from the peril lens (the POST /api/runs fields). */
export interface PerilRunChoice {
  perilProfileIds: string[];
  portfolioId: string | null;
}

/**
 * Peril profiles (searched as someone types) and a portfolio for a new run. A portfolio needs
 * at least one profile (the server refuses it otherwise), so its choice opens once a profile is chosen.
 */
export function PerilRunPicker({
  profileSource,
  portfolios,
  value,
  onChange,
}: {
  profileSource: PickerSource<ProfileOption>;
  portfolios: Array<Pick<PortfolioSummary, "id" | "name" | "rowCount">>;
  value: PerilRunChoice;
  onChange: (next: PerilRunChoice) => void;
}) {
  const choose = (ids: string[]) => onChange({ perilProfileIds: ids, portfolioId: ids.length === 0 ? null : value.portfolioId });
  return (
    <fieldset className="flex flex-col gap-3 rounded-md border border-line p-3">
      <legend className="px-1 text-sm font-medium text-ink">Peril lens (optional)</legend>
      <SearchMultiPicker<ProfileOption>
        label="Peril profiles"
        source={profileSource}
        itemLabel={(p) => p.name}
        itemDetail={(p) => `${p.peril} · ${p.region} · ${p.metric}`}
        value={value.perilProfileIds}
        onChange={choose}
        placeholder="Type part of a profile's name, peril or region…"
        noneChosen="None chosen: the run has no peril lens."
      />
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
        {value.perilProfileIds.length === 0 && (
          <span className="text-xs text-muted">Choose a profile first: a portfolio is projected by its profiles.</span>
        )}
      </label>
    </fieldset>
  );
}
