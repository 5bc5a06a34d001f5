import { Link } from "react-router-dom";
import type { PerilProfileRecord } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { Table, Td, Th } from "@/components/ui/table";

const pct = (v: unknown) => `${Number(((v as number) * 100).toPrecision(12))} %`;

/** The scaling in a few words: "7 %/K (5–95 %: 5 %–9 %)", "table of 5 warming levels". */
export function describeScaling(s: PerilProfileRecord["scaling"]): string {
  if (s.kind === "table") {
    const periods = s.tables.map((t) => t.returnPeriod).join(" and ");
    const levels = s.tables.map((t) => t.points.length).join("/");
    return `table${s.tables.length > 1 ? "s" : ""} for ${periods}-year events, ${levels} warming levels, ${s.beyondTable === "hold" ? "held" : "extrapolated"} beyond`;
  }
  const r = s.rate as Record<string, unknown> & { type: string };
  switch (r.type) {
    case "fixed":
      return `${pct(r.value)} per K`;
    case "range":
      return `${pct(r.p50)} per K (${r.coverage === 90 ? "5–95" : "17–83"} %: ${pct(r.low)} to ${pct(r.high)})`;
    case "triangular":
      return `${pct(r.mode)} per K (triangular ${pct(r.min)} to ${pct(r.max)})`;
    case "uniform":
      return `uniform ${pct(r.min)} to ${pct(r.max)} per K`;
    case "lognormal":
      return `${pct(r.median)} per K (lognormal)`;
    default:
      return `${pct(r.mean)} per K (${r.type})`;
  }
}

export function PerilProfilesTable({ profiles }: { profiles: PerilProfileRecord[] }) {
  return (
    <Table aria-label="Peril profiles">
      <thead>
        <tr>
          <Th>Profile</Th>
          <Th>Peril · region</Th>
          <Th>Metric</Th>
          <Th numeric>Warming in baseline (K)</Th>
          <Th>Scaling</Th>
          <Th>Source</Th>
        </tr>
      </thead>
      <tbody>
        {profiles.map((p) => (
          <tr key={p.id}>
            <Td className="font-medium">
              <Link to={paths.perilProfile.build(p.id)} className="text-accent hover:underline">
                {p.name}
              </Link>
              {p.locked && <span className="ml-2 rounded bg-surface-2 px-1.5 text-[10px] uppercase tracking-wider text-muted">locked</span>}
            </Td>
            <Td>
              {p.peril} · {p.region}
            </Td>
            <Td>{p.metric}</Td>
            <Td numeric>{p.baselineWarming.toFixed(2)}</Td>
            <Td className="text-xs text-muted">{describeScaling(p.scaling)}</Td>
            <Td className="max-w-64 text-xs text-muted">{p.source ?? "–"}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
