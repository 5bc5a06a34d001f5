import { useNavigate, useSearchParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { useModelVersion } from "@/features/model-versions/api/get-model-version";
import { useCreateModelVersion } from "@/features/model-versions/api/save-model-version";
import type { ModelDraft } from "@/features/model-versions/components/model-editor";
import { ModelEditorWithDraft } from "@/features/model-versions/components/model-editor-with-draft";
import { useMe } from "@/features/auth/api/get-me";
import { draftStorageKey } from "@/lib/draft-storage";
import { STARTING_DRAFT } from "@/features/model-versions/lib/starting-draft";
import { perilProfilePickerSource } from "@/features/peril/api/get-peril-profiles";
import { usePerilProfilesByIds } from "@/app/use-peril-profiles-by-ids";
import { PageHeader } from "@/components/ui/page-header";
import { ErrorState, LoadingState } from "@/components/ui/states";

export default function ModelVersionNewPage() {
  const [params] = useSearchParams();
  const fromId = params.get("from") ?? undefined;
  const parent = useModelVersion(fromId);
  const create = useCreateModelVersion();
  const pinnedProfiles = usePerilProfilesByIds(parent.data?.perilProfileIds ?? []);
  const navigate = useNavigate();
  const me = useMe();
  // The kept draft belongs to the person: wait for who is signed in before the editor reads it.
  if (me.isPending || (fromId && parent.isPending)) return <LoadingState />;
  if (fromId && parent.isError) return <ErrorState error={parent.error} />;
  const initial: ModelDraft = parent.data
    ? {
        name: parent.data.name,
        notes: parent.data.notes,
        parentId: parent.data.id,
        model: parent.data.model,
        defaults: parent.data.defaults,
        perilProfileIds: parent.data.perilProfileIds,
      }
    : STARTING_DRAFT;
  return (
    <>
      <PageHeader
        kicker="Model versions"
        title={parent.data ? `New draft from ${parent.data.name} v${parent.data.versionNumber}` : "New model version"}
        description={
          parent.data
            ? "Starts as a copy of its parent; the review will show exactly what you change."
            : "Starts from AR6 assessed ranges (sources in the notes); change what you need."
        }
      />
      <ModelEditorWithDraft
        draftKey={me.data ? draftStorageKey("model-version", me.data.user.id, fromId ? `new-from-${fromId}` : null) : null}
        initial={initial}
        submitLabel="Save draft"
        perilProfiles={{ source: perilProfilePickerSource, known: pinnedProfiles }}
        pending={create.isPending}
        serverError={create.error}
        onSave={(body, saved) => {
          // The editor does not show pinned pathways; a copy keeps its parent's, so the diff shows only real edits.
          const pins = parent.data ? { pathwayIds: parent.data.pathwayIds } : {};
          create.mutate(
            { ...body, ...pins },
            {
              onSuccess: (v) => {
                saved();
                void navigate(paths.modelVersion.build(v.id));
              },
            },
          );
        }}
      />
    </>
  );
}
