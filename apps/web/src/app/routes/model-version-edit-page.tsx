import { useNavigate, useParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { useMe } from "@/features/auth/api/get-me";
import { useModelVersion } from "@/features/model-versions/api/get-model-version";
import { useUpdateModelVersion } from "@/features/model-versions/api/save-model-version";
import { ModelEditorWithDraft } from "@/features/model-versions/components/model-editor-with-draft";
import { perilProfilePickerSource } from "@/features/peril/api/get-peril-profiles";
import { usePerilProfilesByIds } from "@/app/use-peril-profiles-by-ids";
import { PageHeader } from "@/components/ui/page-header";
import { draftStorageKey } from "@/lib/draft-storage";
import { ErrorState, LoadingState } from "@/components/ui/states";

export default function ModelVersionEditPage() {
  const { versionId = "" } = useParams();
  const me = useMe();
  const version = useModelVersion(versionId);
  const update = useUpdateModelVersion();
  const pinnedProfiles = usePerilProfilesByIds(version.data?.perilProfileIds ?? []);
  const navigate = useNavigate();
  if (version.isPending) return <LoadingState />;
  if (version.isError) return <ErrorState error={version.error} />;
  const v = version.data;
  if (v.status !== "draft" || v.authorId !== me.data?.user.id)
    return (
      <ErrorState
        title="This version cannot be edited"
        error={
          new Error(
            v.status !== "draft"
              ? `It is ${v.status}; only drafts change. Make a new draft from it instead.`
              : "Only its author edits a draft.",
          )
        }
      />
    );
  return (
    <>
      <PageHeader
        kicker="Model versions"
        title={`Edit ${v.name} v${v.versionNumber}`}
        description="Drafts can change freely until they are submitted for review."
      />
      <ModelEditorWithDraft
        draftKey={draftStorageKey("model-version", v.authorId, v.id)}
        initial={{
          name: v.name,
          notes: v.notes,
          parentId: v.parentId,
          model: v.model,
          defaults: v.defaults,
          perilProfileIds: v.perilProfileIds,
        }}
        perilProfiles={{ source: perilProfilePickerSource, known: pinnedProfiles }}
        submitLabel="Save changes"
        pending={update.isPending}
        serverError={update.error}
        onSave={(body, saved) => {
          const { parentId: _parent, ...rest } = body;
          update.mutate(
            { id: v.id, body: rest },
            {
              onSuccess: () => {
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
