import { useNavigate, useSearchParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { usePathway } from "@/features/pathways/api/get-pathway";
import { usePathways } from "@/features/pathways/api/get-pathways";
import { PathwayComposeForm } from "@/features/pathways/components/pathway-compose-form";
import { PathwayComposer } from "@/features/pathways/components/pathway-composer";
import { PathwaySelect } from "@/features/pathways/components/pathway-select";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState, ErrorState, LoadingState } from "@/components/ui/states";

const EMPTY = {
  name: "",
  description: "",
  source: "",
  vintage: "",
  startYear: 1850,
  agents: { co2: { erf: [0, 0.01, 0.02] } },
};

/** Pretty JSON with each series on one line, so a 350-year pathway stays readable and editable. */
function compactJson(value: unknown): string {
  return JSON.stringify(value, null, 2).replace(
    /\[\s*(-?[\d.e+-]+(?:,\s*-?[\d.e+-]+)*)\s*\]/g,
    (_, nums: string) => `[${nums.split(/,\s*/).join(", ")}]`,
  );
}

/** The advanced path: the whole pathway as JSON, for people who already hold the numbers. */
function JsonComposer({ fromId }: { fromId: string | undefined }) {
  const from = usePathway(fromId);
  const navigate = useNavigate();
  if (fromId && from.isPending) return <LoadingState />;
  if (fromId && from.isError) return <ErrorState error={from.error} />;
  const body =
    fromId && from.data
      ? compactJson({
          name: `${from.data.name} (variant)`,
          description: from.data.description,
          source: from.data.source,
          vintage: from.data.vintage,
          startYear: from.data.startYear,
          agents: from.data.agents,
        })
      : compactJson(EMPTY);
  return <PathwayComposeForm key={fromId ?? "new"} initialJson={body} onSaved={(p) => navigate(paths.pathway.build(p.id))} />;
}

/** The step composer: choose the pathway to start from, then add steps. */
function StepComposer({ fromId, choose }: { fromId: string | undefined; choose: (id: string) => void }) {
  // Only whether any pathway exists; the picker searches the whole list as someone types.
  const any = usePathways({ limit: 1 });
  const from = usePathway(fromId);
  const navigate = useNavigate();
  if (any.isPending) return <LoadingState label="Loading pathways…" />;
  if (any.isError) return <ErrorState error={any.error} retry={() => any.refetch()} />;
  if (any.data.total === 0)
    return <EmptyState title="No pathways to start from">Upload a pathway first, or write one as JSON (advanced).</EmptyState>;
  return (
    <div className="flex flex-col gap-6">
      <PathwaySelect
        label="Start from"
        hint="The pathway whose numbers the steps change; it stays as it is."
        value={fromId ?? ""}
        onChange={choose}
        selected={from.data}
        className="max-w-xl"
      />
      {fromId && from.isPending && <LoadingState label="Loading the pathway…" />}
      {fromId && from.isError && <ErrorState error={from.error} />}
      {from.data && <PathwayComposer key={from.data.id} base={from.data} onSaved={(p) => navigate(paths.pathway.build(p.id))} />}
    </div>
  );
}

export default function PathwayComposePage() {
  const [params, setParams] = useSearchParams();
  const fromId = params.get("from") ?? undefined;
  const json = params.get("mode") === "json";
  return (
    <>
      <PageHeader
        kicker="Pathways"
        title={json ? "Compose a pathway as JSON" : "Compose a pathway"}
        description={
          json
            ? "Advanced: the whole pathway as JSON, checked live with the schema the API uses."
            : "Start from an existing pathway and change it step by step: scale an agent, splice in years from another pathway, blend two pathways, extend past the last year. It is saved as a new pathway with its recipe."
        }
        actions={
          <ButtonLink to={json ? paths.pathwayCompose.build(fromId) : paths.pathwayCompose.build(fromId, "json")} variant="secondary">
            {json ? "Back to the step composer" : "Advanced: edit as JSON"}
          </ButtonLink>
        }
      />
      <Card>
        <CardBody>
          {json ? <JsonComposer fromId={fromId} /> : <StepComposer fromId={fromId} choose={(id) => setParams(id ? { from: id } : {})} />}
        </CardBody>
      </Card>
    </>
  );
}
