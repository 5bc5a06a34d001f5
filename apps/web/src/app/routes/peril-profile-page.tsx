import { useCallback, useMemo, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { useNavigate, useParams } from "react-router-dom";
import type { PerilProfileBody, PerilProfileRecord } from "@plumeline/contracts";
import { paths } from "@/config/paths";
import { Button, ButtonLink } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { LeaveConfirmDialog } from "@/components/ui/leave-confirm-dialog";
import { PageHeader } from "@/components/ui/page-header";
import { RestoredDraftNotice } from "@/components/ui/restored-draft-notice";
import { canonicalJson, draftStorageKey } from "@/lib/draft-storage";
import { useKeepDraft, useStoredDraft } from "@/lib/use-stored-draft";
import { useUnsavedChangesGuard } from "@/lib/use-unsaved-changes-guard";
import { PanelErrorBoundary } from "@/components/ui/panel-error-boundary";
import { EmptyState, ErrorState, LoadingState, Spinner } from "@/components/ui/states";
import { isApiError } from "@/lib/api-error";
import { usePerilCurvePreview } from "@/features/peril/api/get-peril-curve";
import { getPerilProfileQueryOptions, usePerilProfile } from "@/features/peril/api/get-peril-profile";
import {
  useCopyPerilProfile,
  useCreatePerilProfile,
  useDeletePerilProfile,
  useUpdatePerilProfile,
} from "@/features/peril/api/save-peril-profile";
import { PerilActionError } from "@/features/peril/components/peril-action-error";
import { ChartSourceProvider } from "@/components/charts/chart-source";
import { PerilCurveChart } from "@/features/peril/components/peril-curve-chart";
import { PerilProfileForm } from "@/features/peril/components/peril-profile-form";
import { PerilRecordError } from "@/features/peril/components/peril-record-error";
import { ProfileStatusNote } from "@/features/peril/components/profile-status-note";
import { draftFromRecord, emptyDraft, toProfileBody, type ProfileDraft } from "@/features/peril/lib/profile-draft";
import { storedProfileDraftSchema } from "@/features/peril/lib/profile-draft-schema";
import { useDebouncedValue } from "@/lib/use-debounced-value";
import type { PerilViewer } from "@/features/peril/lib/peril-viewer";
import { usePerilViewer } from "../use-peril-viewer";

/** Server messages keyed by field path, with the preview's "profile." prefix removed. */
function fieldMessages(error: unknown, prefix = ""): Record<string, string> {
  if (!isApiError(error)) return {};
  const out: Record<string, string> = {};
  for (const [path, message] of Object.entries(error.fieldMessages()))
    out[path.startsWith(prefix) ? path.slice(prefix.length) : path] = message;
  return out;
}

/** The draft as the preview sends it: blank name and region filled in, so the curve shows from the first keystroke. */
function previewBody(body: PerilProfileBody | null): PerilProfileBody | null {
  if (!body) return null;
  return { ...body, name: body.name.trim() || "Draft", region: body.region.trim() || "Draft" };
}

function Editor({ record, viewer }: { record: PerilProfileRecord | undefined; viewer: PerilViewer }) {
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const owner = !record || record.createdBy === viewer.userId;
  const readOnly = !viewer.canWrite || Boolean(record?.locked) || !owner;
  // What the server holds: "unsaved changes" means the draft differs from this.
  const loaded = useMemo(() => (record ? draftFromRecord(record) : emptyDraft()), [record]);
  const draftKey = readOnly || !viewer.userId ? null : draftStorageKey("peril-profile", viewer.userId, record?.id);
  const kept = useStoredDraft(draftKey, storedProfileDraftSchema);
  const [draft, setDraft] = useState<ProfileDraft>(() => (kept.found.status === "restored" ? kept.found.value : loaded));
  const dirty = !readOnly && canonicalJson(draft) !== canonicalJson(loaded);
  useKeepDraft(draftKey, draft, dirty);
  const guard = useUnsavedChangesGuard(dirty);
  const { clear } = kept;
  const discard = useCallback(() => {
    clear();
    setDraft(loaded);
  }, [clear, loaded]);
  const settled = useDebouncedValue(draft);
  const parsed = useMemo(() => toProfileBody(settled), [settled]);
  const curve = usePerilCurvePreview(previewBody(parsed.body));
  const create = useCreatePerilProfile();
  const update = useUpdatePerilProfile();
  const copy = useCopyPerilProfile();
  const remove = useDeletePerilProfile();

  const saveError = create.error ?? update.error;
  const errors = { ...fieldMessages(curve.error, "profile."), ...fieldMessages(saveError), ...(toProfileBody(draft).errors ?? {}) };
  if (draft.name.trim() !== "" || !saveError) delete errors.name;
  if (!saveError) delete errors.region;

  async function save() {
    const out = toProfileBody(draft);
    if (!out.body) return;
    const saved = await (record ? update.mutateAsync({ id: record.id, body: out.body }) : create.mutateAsync(out.body)).catch(
      (e: unknown) => {
        // Locked or handed over since the page opened: re-read the record so the form turns
        // read-only and the note says why, instead of inviting the same refused save again.
        if (record && isApiError(e) && (e.status === 409 || e.status === 403))
          void queryClient.invalidateQueries({ queryKey: getPerilProfileQueryOptions(record.id).queryKey });
        return null;
      },
    );
    if (!saved) return;
    guard.allowNextNavigation();
    clear();
    void navigate(paths.perilProfile.build(saved.id), { replace: !record });
  }
  async function copyIt() {
    if (!record) return;
    const created = await copy.mutateAsync({ id: record.id }).catch(() => null);
    if (!created) return;
    void navigate(paths.perilProfile.build(created.id));
  }
  async function deleteIt() {
    if (!record || !window.confirm(`Delete the peril profile “${record.name}”?`)) return;
    const removed = await remove.mutateAsync(record.id).then(
      () => true,
      () => false,
    );
    if (!removed) return;
    // Already confirmed, and there is nothing left to save the changes to.
    guard.allowNextNavigation();
    clear();
    void navigate(paths.perils.build());
  }

  return (
    <>
      <PageHeader
        kicker="Peril lens · profile"
        title={record ? record.name : "New peril profile"}
        description="How a hazard or loss metric scales with global warming beyond what the firm's risk view already holds."
        actions={
          <>
            <ButtonLink to={paths.perils.build()} variant="secondary">
              Back to the peril lens
            </ButtonLink>
            {record && viewer.canWrite && (
              <Button variant="secondary" onClick={copyIt} disabled={copy.isPending}>
                Copy
              </Button>
            )}
            {record && owner && viewer.canWrite && !record.locked && (
              <Button variant="danger" onClick={deleteIt} disabled={remove.isPending}>
                Delete
              </Button>
            )}
          </>
        }
      />
      <ProfileStatusNote record={record} canWrite={viewer.canWrite} owner={owner} />
      <RestoredDraftNotice found={kept.found} onDiscard={discard} onDismiss={kept.dismiss} />
      <div className="mb-4 empty:hidden">
        <PerilActionError error={copy.error ?? remove.error} />
      </div>
      {/* minmax(0, 1fr): the chart's drawn width must not squeeze the form column (it did, to a 66 px Name box at 1280 px). */}
      <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <Card>
          <CardHeader title="Profile" />
          <CardBody>
            <PerilProfileForm draft={draft} onChange={setDraft} errors={errors} readOnly={readOnly} />
            {!readOnly && (
              <div className="mt-4 flex items-center gap-3">
                <Button onClick={save} disabled={create.isPending || update.isPending || toProfileBody(draft).body === null}>
                  {create.isPending || update.isPending ? "Saving…" : record ? "Save changes" : "Create profile"}
                </Button>
              </div>
            )}
            {/* Outside the editable branch: a refused save that turned the form read-only still says why. */}
            <div className="mt-4 empty:hidden">
              <PerilActionError error={saveError} />
            </div>
          </CardBody>
        </Card>
        <Card>
          <CardHeader
            title="Preview"
            subtitle="Multiplier against warming; the marker is the warming already in the risk view."
            actions={curve.isFetching ? <Spinner /> : null}
          />
          <CardBody>
            <PanelErrorBoundary resetKey={JSON.stringify(settled)}>
              {curve.data ? (
                // A profile preview has no run: its downloads name the profile and say it is a preview of the form.
                <ChartSourceProvider
                  source={{
                    lines: [
                      `Peril profile “${record?.name ?? "new, not saved"}”${record ? ` · last saved ${record.updatedAt.slice(0, 10)}` : ""} · preview of the profile as edited on screen`,
                    ],
                    fileLabel: record?.name,
                  }}
                >
                  <PerilCurveChart curve={curve.data} />
                </ChartSourceProvider>
              ) : curve.isError ? (
                <ErrorState error={curve.error} title="The preview needs a valid profile" />
              ) : parsed.body === null ? (
                // No request is made for a draft with a field that is not a number, so waiting would never end.
                <EmptyState title="No curve yet">Fill in the marked fields with numbers to draw the multiplier curve.</EmptyState>
              ) : (
                <LoadingState label="Drawing the curve…" />
              )}
            </PanelErrorBoundary>
            {curve.data && (curve.isError || parsed.body === null) && (
              <p className="mt-2 text-xs text-danger">The curve shows the last valid draft; fix the marked fields.</p>
            )}
          </CardBody>
        </Card>
      </div>
      <LeaveConfirmDialog blocker={guard.blocker} onDiscard={clear} />
    </>
  );
}

/** New profile (no id in the URL) or an existing one: editable by its creator while unlocked. */
export function PerilProfileEditor({ viewer }: { viewer: PerilViewer }) {
  const { profileId } = useParams();
  const existing = usePerilProfile(profileId);
  if (profileId && existing.isPending) return <LoadingState label="Loading profile…" />;
  if (profileId && existing.isError)
    return <PerilRecordError noun="peril profile" error={existing.error} retry={() => existing.refetch()} />;
  return <Editor key={profileId ?? "new"} record={existing.data} viewer={viewer} />;
}

/** A peril profile, new or existing, edited by the signed-in person. */
export default function PerilProfilePage() {
  return <PerilProfileEditor viewer={usePerilViewer()} />;
}
