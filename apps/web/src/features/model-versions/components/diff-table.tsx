import type { ModelVersionDiff } from "@plumeline/contracts";
import { Table, Td, Th } from "@/components/ui/table";
import { EmptyState } from "@/components/ui/states";
import { TextLineDiff } from "./text-line-diff";

const show = (v: unknown) => (v === null || v === undefined ? "—" : typeof v === "string" ? v : JSON.stringify(v));
/** A text field's value for the line diff ("" when absent). */
const asText = (v: unknown) => (v === null || v === undefined ? "" : typeof v === "string" ? v : JSON.stringify(v));

/** Pinned peril profiles read as names when the caller knows them (ids otherwise). */
const showValue = (path: string, v: unknown, profileNames?: ReadonlyMap<string, string>) =>
  path === "perilProfileIds" && Array.isArray(v) && profileNames
    ? v.length === 0
      ? "none"
      : v.map((id) => profileNames.get(String(id)) ?? String(id)).join("; ")
    : show(v);

/** Texts of more than one line (the notes) read better as a line diff than as two blocks. */
const isMultiLineText = (before: unknown, after: unknown) =>
  (typeof before === "string" || before == null) &&
  (typeof after === "string" || after == null) &&
  `${before ?? ""}${after ?? ""}`.includes("\n");

/** What changed against the parent (or another version), one line per changed field. */
export function DiffTable({ diff, profileNames }: { diff: ModelVersionDiff; profileNames?: ReadonlyMap<string, string> }) {
  if (!diff.against) return <p className="text-sm text-muted">This version has no parent: everything in it is new.</p>;
  if (diff.changes.length === 0) return <EmptyState title={`No differences from ${diff.against.name} v${diff.against.versionNumber}`} />;
  return (
    <Table>
      <caption className="mb-2 text-left text-sm text-muted">
        Against {diff.against.name} v{diff.against.versionNumber}: {diff.changes.length} change{diff.changes.length === 1 ? "" : "s"}
      </caption>
      <thead>
        <tr>
          <Th>Field</Th>
          <Th>Before</Th>
          <Th>After</Th>
        </tr>
      </thead>
      <tbody>
        {diff.changes.map((c) =>
          isMultiLineText(c.before, c.after) ? (
            <tr key={c.path}>
              <Td>
                <code className="text-xs">{c.path}</code>
              </Td>
              <Td colSpan={2}>
                <TextLineDiff before={asText(c.before)} after={asText(c.after)} />
              </Td>
            </tr>
          ) : (
            <tr key={c.path}>
              <Td>
                <code className="text-xs">{c.path}</code>
              </Td>
              <Td className="num max-w-sm text-xs [overflow-wrap:anywhere]">
                <span className="rounded bg-danger-soft px-1">{showValue(c.path, c.before, profileNames)}</span>
              </Td>
              <Td className="num max-w-sm text-xs [overflow-wrap:anywhere]">
                <span className="rounded bg-ok-soft px-1">{showValue(c.path, c.after, profileNames)}</span>
              </Td>
            </tr>
          ),
        )}
      </tbody>
    </Table>
  );
}
