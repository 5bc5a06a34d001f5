import { useState } from "react";
import { useNavigate } from "react-router-dom";
import type { PortfolioPreview } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { Button, ButtonLink } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Field, Input, Textarea } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page-header";
import { usePreviewPortfolioUpload, useUploadPortfolio } from "@/features/peril/api/upload-portfolio";
import { PortfolioRowsTable } from "@/features/peril/components/portfolio-rows-table";
import { UploadErrors } from "@/features/peril/components/upload-errors";

/**
 * Upload a portfolio baseline (CSV or XLSX): check it first — the server reads every row and
 * names each problem by row and column — then save. Nothing is saved from a file with a problem.
 */
export default function PortfolioUploadPage() {
  const navigate = useNavigate();
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState("");
  const [description, setDescription] = useState("");
  const [preview, setPreview] = useState<PortfolioPreview | null>(null);
  const check = usePreviewPortfolioUpload();
  const upload = useUploadPortfolio();
  const error = upload.error ?? check.error;

  async function runCheck() {
    if (!file) return;
    upload.reset();
    setPreview(await check.mutateAsync({ file, name, description }).catch(() => null));
  }
  async function save() {
    if (!file) return;
    const saved = await upload.mutateAsync({ file, name, description });
    navigate(paths.portfolio.build(saved.id));
  }

  return (
    <>
      <PageHeader
        kicker="Peril lens · portfolio"
        title="Upload a portfolio baseline"
        description="One row per region and peril: region, peril, currency (ISO 4217), aal, loss100, loss200 — the firm's own figures, in the row's currency."
        actions={
          <ButtonLink to={paths.perils.build()} variant="secondary">
            Back to the peril lens
          </ButtonLink>
        }
      />
      <div className="flex flex-col gap-6">
        <Card>
          <CardBody className="grid gap-4 sm:grid-cols-2">
            <Field label="File (.csv or .xlsx)" hint="Header row: region, peril, currency, aal, loss100, loss200 (any order). At most 1 MB.">
              {(a) => (
                <Input
                  {...a}
                  type="file"
                  accept=".csv,.xlsx"
                  onChange={(e) => {
                    setFile(e.target.files?.[0] ?? null);
                    setPreview(null);
                    check.reset();
                    upload.reset();
                  }}
                />
              )}
            </Field>
            <Field label="Name" error={upload.error && !name.trim() ? "must not be empty" : undefined}>
              {(a) => <Input {...a} value={name} onChange={(e) => setName(e.target.value)} />}
            </Field>
            <Field label="Description" className="sm:col-span-2">
              {(a) => <Textarea {...a} value={description} onChange={(e) => setDescription(e.target.value)} />}
            </Field>
            <div className="flex gap-3 sm:col-span-2">
              <Button variant="secondary" onClick={runCheck} disabled={!file || check.isPending}>
                {check.isPending ? "Reading file…" : "Check file (nothing is saved)"}
              </Button>
              <Button onClick={save} disabled={!file || !preview || !name.trim() || upload.isPending}>
                {upload.isPending ? "Saving…" : "Save portfolio"}
              </Button>
              {!preview && file && !check.isPending && !error && <p className="self-center text-xs text-muted">Check the file before saving it.</p>}
            </div>
          </CardBody>
        </Card>
        <UploadErrors error={error} />
        {preview && (
          <Card>
            <CardHeader
              title={`${preview.rowCount} row${preview.rowCount === 1 ? "" : "s"} read`}
              subtitle={
                <>
                  Currencies {preview.currencies.join(", ")} · checksum <span className="font-mono text-xs">{preview.checksum.slice(0, 16)}…</span>
                </>
              }
            />
            <PortfolioRowsTable rows={preview.rows} caption="Rows read from the file" />
          </Card>
        )}
      </div>
    </>
  );
}
