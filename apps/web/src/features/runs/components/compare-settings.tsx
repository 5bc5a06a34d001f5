import type { Run } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { compareSettings } from "../lib/compare-settings";

/** The compared runs' settings in columns by run name; the ones that differ listed first and marked. */
export function CompareSettings({ runs }: { runs: Run[] }) {
  const rows = compareSettings(runs);
  const differing = rows.filter((r) => r.differs);
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink" data-testid="differing-settings">
        {differing.length === 0
          ? "The runs share every setting listed below."
          : `Differ: ${differing.map((r) => r.name.toLowerCase()).join(", ")}.`}
      </p>
      <Table>
        <caption className="sr-only">Settings of the compared runs</caption>
        <thead>
          <tr>
            <Th>Setting</Th>
            {runs.map((r, i) => (
              <Th key={`${r.id}-${i}`}>
                {r.name || r.id.slice(0, 8)}
                {i === 0 && <span className="ml-1 font-normal normal-case">(reference)</span>}
              </Th>
            ))}
          </tr>
        </thead>
        <tbody>
          {[...differing, ...rows.filter((r) => !r.differs)].map((row) => (
            <tr key={row.name} data-differs={row.differs} className={row.differs ? "bg-ember-50" : undefined}>
              <th scope="row" className="border-b border-line px-3 py-2 text-left text-sm font-medium text-ink">
                {row.name}
                {row.differs && <span className="ml-1 text-xs font-normal text-ember-800">differs</span>}
              </th>
              {row.values.map((v, i) => (
                <Td key={i} className="break-words text-sm">
                  {v}
                </Td>
              ))}
            </tr>
          ))}
        </tbody>
      </Table>
    </div>
  );
}
