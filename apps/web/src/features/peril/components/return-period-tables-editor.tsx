import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import type { DraftTable, ProfileDraft } from "../lib/profile-draft";

type TablesPart = Pick<ProfileDraft, "tables" | "beyondTable" | "beyondReturnPeriods">;

/** The error the server gave for one API field path, if any. */
const errorAt = (errors: Record<string, string>, path: string) => errors[path];

/**
 * Table scaling: one table per event return period. Each table says which events its values
 * describe ("1-in-10-year events"), then the metric at each warming level. Between return
 * periods the lens reads along a straight line in log return period; what happens beyond the
 * warming levels and beyond the return periods is chosen below the tables.
 */
export function ReturnPeriodTablesEditor({
  value,
  onChange,
  errors,
  readOnly,
}: {
  value: TablesPart;
  onChange: (next: Partial<TablesPart>) => void;
  errors: Record<string, string>;
  readOnly: boolean;
}) {
  const setTable = (k: number, next: DraftTable) => onChange({ tables: value.tables.map((t, j) => (j === k ? next : t)) });
  const setPoint = (k: number, i: number, key: "warming" | "multiplier", text: string) => {
    const table = value.tables[k]!;
    setTable(k, { ...table, points: table.points.map((p, j) => (j === i ? { ...p, [key]: text } : p)) });
  };
  const addTable = () => {
    const last = value.tables[value.tables.length - 1];
    const next = last ? String(Number(last.returnPeriod) * 5 || "") : "10";
    onChange({ tables: [...value.tables, { returnPeriod: next, points: last ? last.points.map((p) => ({ warming: p.warming, multiplier: "" })) : [] }] });
  };

  return (
    <fieldset className="rounded-md border border-line p-3">
      <legend className="px-1 text-xs text-muted">
        Metric at each warming level (any fixed reference), one table per event return period; divided by its value at the risk view's warming
      </legend>
      <div className="flex flex-col gap-4">
        {value.tables.map((table, k) => (
          <section key={k} aria-label={`Table ${k + 1}`} className="rounded border border-line/60 p-2">
            <div className="flex flex-wrap items-end gap-3">
              <Field
                label={`Table ${k + 1}: events of return period (years)`}
                hint="The events the values describe, e.g. 10 for a 1-in-10-year event."
                error={errorAt(errors, `scaling.tables[${k}].returnPeriod`)}
              >
                {(a) => (
                  <Input {...a} inputMode="decimal" value={table.returnPeriod} disabled={readOnly} onChange={(e) => setTable(k, { ...table, returnPeriod: e.target.value })} />
                )}
              </Field>
              {!readOnly && value.tables.length > 1 && (
                <Button size="sm" variant="ghost" onClick={() => onChange({ tables: value.tables.filter((_, j) => j !== k) })} aria-label={`Remove table ${k + 1}`}>
                  Remove table
                </Button>
              )}
            </div>
            <table className="mt-2 w-full text-sm">
              <thead>
                <tr className="text-left text-xs text-muted">
                  <th className="pb-1 font-medium">Warming (K above 1850–1900)</th>
                  <th className="pb-1 font-medium">Value</th>
                  <th />
                </tr>
              </thead>
              <tbody>
                {table.points.map((p, i) => (
                  <tr key={i}>
                    {(["warming", "multiplier"] as const).map((key) => {
                      const path = `scaling.tables[${k}].points[${i}].${key}`;
                      return (
                        <td key={key} className="pb-2 pr-2 align-top">
                          <Input
                            aria-label={`Table ${k + 1} point ${i + 1} ${key === "warming" ? "warming" : "value"}`}
                            aria-invalid={errors[path] ? true : undefined}
                            inputMode="decimal"
                            value={p[key]}
                            disabled={readOnly}
                            onChange={(e) => setPoint(k, i, key, e.target.value)}
                          />
                          {errors[path] && (
                            <p role="alert" className="mt-0.5 text-xs font-medium text-danger">
                              {errors[path]}
                            </p>
                          )}
                        </td>
                      );
                    })}
                    <td className="pb-2 align-top">
                      {!readOnly && table.points.length > 2 && (
                        <Button
                          size="sm"
                          variant="ghost"
                          onClick={() => setTable(k, { ...table, points: table.points.filter((_, j) => j !== i) })}
                          aria-label={`Remove table ${k + 1} point ${i + 1}`}
                        >
                          Remove
                        </Button>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            {errors[`scaling.tables[${k}].points`] && (
              <p className="text-xs font-medium text-danger" role="alert">
                {errors[`scaling.tables[${k}].points`]}
              </p>
            )}
            {!readOnly && (
              <Button size="sm" variant="secondary" onClick={() => setTable(k, { ...table, points: [...table.points, { warming: "", multiplier: "" }] })}>
                Add point to table {k + 1}
              </Button>
            )}
          </section>
        ))}
      </div>
      {errors["scaling.tables"] && (
        <p className="mt-2 text-xs font-medium text-danger" role="alert">
          {errors["scaling.tables"]}
        </p>
      )}
      <div className="mt-3 flex flex-wrap items-end gap-3">
        {!readOnly && value.tables.length < 6 && (
          <Button size="sm" variant="secondary" onClick={addTable}>
            Add a table for another return period
          </Button>
        )}
        <Field label="Beyond the warming levels">
          {(a) => (
            <Select {...a} value={value.beyondTable} disabled={readOnly} onChange={(e) => onChange({ beyondTable: e.target.value as "hold" | "extrapolate" })}>
              <option value="hold">hold the end value</option>
              <option value="extrapolate">continue the end segment's rate</option>
            </Select>
          )}
        </Field>
        <Field label="Beyond the tables' return periods" hint="Results flag the 1-in-100 and 1-in-200 figures read there.">
          {(a) => (
            <Select {...a} value={value.beyondReturnPeriods} disabled={readOnly} onChange={(e) => onChange({ beyondReturnPeriods: e.target.value as "hold" | "extrapolate" })}>
              <option value="hold">hold the nearest table</option>
              <option value="extrapolate">continue the end segment (power law)</option>
            </Select>
          )}
        </Field>
      </div>
    </fieldset>
  );
}
