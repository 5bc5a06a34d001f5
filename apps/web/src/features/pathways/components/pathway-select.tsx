import { Field, Select } from "@/components/ui/field";

/** A stored pathway as a picker lists it. */
export interface PathwayChoice {
  id: string;
  name: string;
  startYear: number;
  endYear: number;
}

/** A labelled picker of stored pathways, each shown with its years; "" while none is chosen. */
export function PathwaySelect({
  label,
  value,
  onChange,
  choices,
  error,
  hint,
  className,
}: {
  label: string;
  value: string;
  onChange: (id: string) => void;
  choices: PathwayChoice[];
  error?: string;
  hint?: string;
  className?: string;
}) {
  return (
    <Field label={label} error={error} hint={hint}>
      {(p) => (
        <Select {...p} value={value} onChange={(e) => onChange(e.target.value)} {...(className ? { className } : {})}>
          <option value="">Choose a pathway…</option>
          {choices.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name} ({c.startYear}–{c.endYear})
            </option>
          ))}
        </Select>
      )}
    </Field>
  );
}
