import type { PathwayPreview } from "@plumeline/contracts";
import { PathwayCharts } from "./pathway-charts";
import { PathwayPreviewTable } from "./pathway-preview-table";

/**
 * What the server read from an uploaded file, before anything is saved: the columns it
 * recognised, every year drawn (forcing by agent with its total; concentrations beside it),
 * then the first rows as numbers.
 */
export function PathwayUploadPreview({ name, preview }: { name: string; preview: PathwayPreview }) {
  return (
    <>
      <h2 id="preview-title" className="text-base font-semibold">
        Preview: {preview.startYear}–{preview.endYear}, {preview.agents.length} agents
      </h2>
      <p className="text-sm text-muted">
        Columns read:{" "}
        {preview.agents.map((a) => (
          <code key={a.column} className="mr-2">
            {a.column} → {a.agent} ({a.quantity === "erf" ? "W m-2" : a.quantity})
          </code>
        ))}
      </p>
      {/* Every year drawn before anything is saved: a unit slip or a stray sign shows at a glance, which 20 rows do not. */}
      <PathwayCharts name={name || "the file"} startYear={preview.startYear} agents={preview.series} />
      <PathwayPreviewTable rows={preview.rows} />
      <p className="text-xs text-muted">First {preview.rows.length} rows shown.</p>
    </>
  );
}
