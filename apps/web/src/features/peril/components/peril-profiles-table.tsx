import type { PerilProfileRecord } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";

function describeScaling(s: PerilProfileRecord["scaling"]): string {
  const v = s as { type?: string; kind?: string; points?: unknown[] };
  const kind = v.type ?? v.kind ?? "scaling";
  return kind === "table" && Array.isArray(v.points) ? `table of ${v.points.length} warming levels` : kind;
}

export function PerilProfilesTable({ profiles }: { profiles: PerilProfileRecord[] }) {
  return (
    <Table>
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
              {p.name}
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
