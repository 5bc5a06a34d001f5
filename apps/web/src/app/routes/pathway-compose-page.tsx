import { useNavigate, useSearchParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { usePathway } from "@/features/pathways/api/get-pathway";
import { PathwayComposeForm } from "@/features/pathways/components/pathway-compose-form";
import { Card, CardBody } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { ErrorState, LoadingState } from "@/components/ui/states";

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
  return JSON.stringify(value, null, 2).replace(/\[\s*(-?[\d.e+-]+(?:,\s*-?[\d.e+-]+)*)\s*\]/g, (_, nums: string) => `[${nums.split(/,\s*/).join(", ")}]`);
}

export default function PathwayComposePage() {
  const [params] = useSearchParams();
  const fromId = params.get("from") ?? undefined;
  const from = usePathway(fromId);
  const navigate = useNavigate();
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
  return (
    <>
      <PageHeader
        kicker="Pathways"
        title="Compose a pathway"
        description={fromId ? "Starts from the JSON of an existing pathway; change what you need and save it as a new pathway." : "Write the pathway as JSON."}
      />
      <Card>
        <CardBody>
          {fromId && from.isPending ? (
            <LoadingState />
          ) : fromId && from.isError ? (
            <ErrorState error={from.error} />
          ) : (
            <PathwayComposeForm key={fromId ?? "new"} initialJson={body} onSaved={(p) => navigate(paths.pathway.build(p.id))} />
          )}
        </CardBody>
      </Card>
    </>
  );
}
