import { useNavigate, useSearchParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { useModelVersion } from "@/features/model-versions/api/get-model-version";
import { useCreateModelVersion } from "@/features/model-versions/api/save-model-version";
import { ModelEditor, type ModelDraft } from "@/features/model-versions/components/model-editor";
import { STARTING_DRAFT } from "@/features/model-versions/lib/starting-draft";
import { usePerilProfileChoices } from "@/features/peril/api/get-peril-profiles";
import { PageHeader } from "@/components/ui/page-header";
import { ErrorState, LoadingState } from "@/components/ui/states";

export default function ModelVersionNewPage() {
  const [params] = useSearchParams();
  const fromId = params.get("from") ?? undefined;
  const parent = useModelVersion(fromId);
  const create = useCreateModelVersion();
  const profiles = usePerilProfileChoices();
  const navigate = useNavigate();
  if (fromId && parent.isPending) return <LoadingState />;
  if (fromId && parent.isError) return <ErrorState error={parent.error} />;
  const initial: ModelDraft = parent.data
    ? { name: parent.data.name, notes: parent.data.notes, parentId: parent.data.id, model: parent.data.model, defaults: parent.data.defaults, perilProfileIds: parent.data.perilProfileIds }
    : STARTING_DRAFT;
  return (
    <>
      <PageHeader
        kicker="Model versions"
        title={parent.data ? `New draft from ${parent.data.name} v${parent.data.versionNumber}` : "New model version"}
        description={parent.data ? "Starts as a copy of its parent; the review will show exactly what you change." : "Starts from AR6 assessed ranges (sources in the notes); change what you need."}
      />
      <ModelEditor
        initial={initial}
        submitLabel="Save draft"
        perilProfiles={profiles.data}
        pending={create.isPending}
        serverError={create.error}
        onSave={(body) => {
          // The editor does not show pinned pathways; a copy keeps its parent's, so the diff shows only real edits.
          const pins = parent.data ? { pathwayIds: parent.data.pathwayIds } : {};
          create.mutate({ ...body, ...pins }, { onSuccess: (v) => void navigate(paths.modelVersion.build(v.id)) });
        }}
      />
    </>
  );
}
