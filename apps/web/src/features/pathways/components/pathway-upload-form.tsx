import { useState, type SubmitEvent } from "react";
import { pathwayMetadataSchema, type Pathway, type PathwayPreview } from "@plumeline/contracts";
import { Button } from "@/components/ui/button";
import { Field, Input, Textarea } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { isApiError } from "@/lib/api-error";
import { PathwayUploadPreview } from "./pathway-upload-preview";
import { usePreviewPathwayUpload, useUploadPathway, type PathwayUploadInput } from "../api/upload-pathway";
import { fieldErrors } from "@/lib/field-errors";

type FieldName = "file" | "name" | "source" | "vintage" | "description";
const MAX_BYTES = 5 * 1024 * 1024;

/**
 * Upload in two steps: the server parses the file and shows what it read (or every row and
 * column it could not read) — nothing is saved — and only then may the user save it.
 */
export function PathwayUploadForm({ onSaved }: { onSaved: (p: Pathway) => void }) {
  const preview = usePreviewPathwayUpload();
  const upload = useUploadPathway();
  const [errors, setErrors] = useState<Partial<Record<FieldName, string>>>({});
  const [input, setInput] = useState<PathwayUploadInput | null>(null);

  function read(form: HTMLFormElement): PathwayUploadInput | null {
    const data = new FormData(form);
    const file = data.get("file");
    const meta = { name: data.get("name"), source: data.get("source"), vintage: data.get("vintage"), description: data.get("description") ?? "" };
    const parsed = pathwayMetadataSchema.safeParse(meta);
    const next: Partial<Record<FieldName, string>> = parsed.success ? {} : fieldErrors<FieldName>(parsed.error);
    if (!(file instanceof File) || file.size === 0) next.file = "Choose a .csv or .xlsx file";
    else if (!/\.(csv|xlsx)$/i.test(file.name)) next.file = "must be a .csv or .xlsx file";
    else if (file.size > MAX_BYTES) next.file = "is larger than 5 MB";
    setErrors(next);
    if (Object.keys(next).length || !parsed.success || !(file instanceof File)) return null;
    return { file, ...parsed.data };
  }

  function onPreview(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    const value = read(e.currentTarget);
    if (!value) return;
    setInput(value);
    upload.reset();
    preview.mutate(value);
  }

  const result: PathwayPreview | undefined = preview.data;
  const rowErrors = isApiError(preview.error) ? preview.error : null;

  return (
    <div className="flex flex-col gap-6">
      <form noValidate onSubmit={onPreview} className="grid gap-4 lg:grid-cols-2">
        <Field
          label="File"
          error={errors.file}
          className="lg:col-span-2"
          hint={
            <>
              CSV or XLSX: a <code>year</code> column, then one column per agent — <code>co2_ppm</code>, <code>ch4_ppb</code>, <code>n2o_ppb</code> or{" "}
              <code>&lt;agent&gt;_erf_wm2</code> (W m-2), e.g. <code>aerosol-cloud_erf_wm2</code>.
            </>
          }
        >
          {(p) => <Input {...p} type="file" name="file" accept=".csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet" />}
        </Field>
        <Field label="Name" error={errors.name}>
          {(p) => <Input {...p} name="name" maxLength={120} />}
        </Field>
        <Field label="Vintage" error={errors.vintage} hint="Release or edition of the source, e.g. “2024 release”.">
          {(p) => <Input {...p} name="vintage" maxLength={120} />}
        </Field>
        <Field label="Source" error={errors.source} hint="Publication or dataset the numbers came from." className="lg:col-span-2">
          {(p) => <Input {...p} name="source" maxLength={500} />}
        </Field>
        <Field label="Description (optional)" error={errors.description} className="lg:col-span-2">
          {(p) => <Textarea {...p} name="description" maxLength={2000} rows={2} />}
        </Field>
        <div className="lg:col-span-2">
          <Button type="submit" variant="secondary" disabled={preview.isPending}>
            {preview.isPending ? "Reading file…" : "Check file (nothing is saved)"}
          </Button>
        </div>
      </form>

      {rowErrors && (
        <ErrorState
          title={rowErrors.status === 400 ? "The file cannot be imported as it is" : undefined}
          error={rowErrors}
        />
      )}
      {result && input && (
        <section aria-labelledby="preview-title" className="flex flex-col gap-3">
          <PathwayUploadPreview name={input.name} preview={result} />
          {upload.error && <ErrorState error={upload.error} />}
          <div>
            <Button onClick={() => upload.mutate(input, { onSuccess: onSaved })} disabled={upload.isPending}>
              {upload.isPending ? "Saving…" : "Save pathway"}
            </Button>
          </div>
        </section>
      )}
    </div>
  );
}
