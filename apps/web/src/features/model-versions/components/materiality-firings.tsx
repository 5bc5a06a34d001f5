import type { MaterialityFiring, MaterialityPolicy } from "@plumeline/contracts";
import { describeFiring } from "../lib/describe-firing";

/**
 * Which materiality thresholds a preview passes, one line each ("fired: median shift +0.14 K >
 * 0.1 K on Harbourline Middle 2050"), or a quiet line saying none did. The reviewer reads it
 * beside the change class the author chose.
 */
export function MaterialityFirings({ fired, policy, changeClass }: { fired: MaterialityFiring[]; policy: MaterialityPolicy; changeClass?: "major" | "minor" | null }) {
  const limits = `${policy.medianShiftK} K on a median, ${policy.exceedancePoints} points on an exceedance probability, ${policy.widthChangePercent} % on a 5–95 % width`;
  if (fired.length === 0)
    return (
      <p className="rounded-md border border-line bg-surface-2 px-3 py-2 text-sm" aria-label="Materiality">
        No materiality threshold fired on the previewed pathways (limits: {limits}).
      </p>
    );
  return (
    <section aria-label="Materiality" className="rounded-md border border-ember-400 bg-ember-50 px-3 py-2 text-sm text-ember-800">
      <p className="font-medium">
        {fired.length} materiality threshold{fired.length === 1 ? "" : "s"} fired
        {changeClass === "minor" ? " — yet the change is classed as minor" : changeClass === "major" ? " — the change is classed as major" : ""}.
      </p>
      <ul className="mt-1 list-disc pl-5">
        {fired.slice(0, 12).map((f) => (
          <li key={`${f.pathwayId}-${f.year}-${f.metric}-${f.warmingThreshold ?? ""}`}>fired: {describeFiring(f)}</li>
        ))}
      </ul>
      {fired.length > 12 && <p className="mt-1">…and {fired.length - 12} more.</p>}
      <p className="mt-1 text-xs">Limits set by the firm's admins: {limits}. The preview is indicative; the run is the record.</p>
    </section>
  );
}
