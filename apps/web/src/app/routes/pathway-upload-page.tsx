import { useNavigate } from "react-router-dom";
import { paths } from "@/config/paths";
import { PathwayUploadForm } from "@/features/pathways/components/pathway-upload-form";
import { Card, CardBody } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";

export default function PathwayUploadPage() {
  const navigate = useNavigate();
  return (
    <>
      <PageHeader kicker="Pathways" title="Upload a pathway" description="The server reads the file and shows what it found before anything is saved; every problem names its row and column." />
      <Card>
        <CardBody>
          <PathwayUploadForm onSaved={(p) => navigate(paths.pathway.build(p.id))} />
        </CardBody>
      </Card>
    </>
  );
}
