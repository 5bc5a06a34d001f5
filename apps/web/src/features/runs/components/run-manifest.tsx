import { Link } from "react-router-dom";
import type { Run } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { formatDateTime, formatInteger } from "@/lib/format";

/**
 * What makes the run reproducible: version, pathways with checksums, seed, engine, hashes.
 * One column (facts, then pathways): side by side, the values got ~150 px at 1440 px and
 * the version name and result hash broke over five lines.
 */
export function RunManifest({ run }: { run: Run }) {
  const items: Array<[string, React.ReactNode]> = [
    [
      "Model version",
      <Link key="mv" to={paths.modelVersion.build(run.modelVersion.id)} className="text-accent hover:underline">
        {run.modelVersion.name} v{run.modelVersion.versionNumber} ({run.modelVersion.status})
      </Link>,
    ],
    ["Members", <span className="num">{formatInteger(run.members)}</span>],
    ["Sampling", run.sampling === "latin-hypercube" ? "Latin hypercube" : "Monte Carlo"],
    ["Seed", <code className="num">{run.seed}</code>],
    ["Engine", <code className="num">{run.manifest.engineVersion ?? "–"}</code>],
    ["Result hash", <code className="num break-all">{run.manifest.resultHash ?? "–"}</code>],
    ["Started by", `${run.createdByName ?? "–"}, ${formatDateTime(run.createdAt)}`],
  ];
  return (
    <div className="flex flex-col gap-4 text-sm">
      <dl className="grid grid-cols-[8rem_minmax(0,1fr)] gap-x-3 gap-y-1.5">
        {items.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-muted">{k}</dt>
            <dd className="min-w-0">{v}</dd>
          </div>
        ))}
      </dl>
      <div className="border-t border-line pt-3">
        <p className="mb-1 text-muted">Pathways (source, vintage, checksum)</p>
        <ul className="space-y-1.5">
          {run.manifest.pathways.map((p) => (
            <li key={p.id}>
              <Link to={paths.pathway.build(p.id)} className="font-medium text-accent hover:underline">
                {p.name}
              </Link>{" "}
              <span className="text-muted">— {p.vintage}</span>
              <span className="line-clamp-2 text-xs text-muted" title={p.source}>
                {p.source}
              </span>
              <code className="num block truncate text-[11px] text-faint" title={p.checksum}>
                {p.checksum}
              </code>
            </li>
          ))}
        </ul>
      </div>
    </div>
  );
}
