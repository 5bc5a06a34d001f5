import { useMe } from "@/features/auth/api/get-me";
import { AdminTabs } from "@/features/admin/components/admin-tabs";
import { useMateriality } from "@/features/settings/api/get-materiality";
import { MaterialityForm } from "@/features/settings/components/materiality-form";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { ErrorState, LoadingState } from "@/components/ui/states";

export default function AdminSettingsPage() {
  const me = useMe();
  const settings = useMateriality();
  return (
    <>
      <PageHeader kicker="Admin" title="Review policy" description="The materiality thresholds a minor model change must stay under." />
      <AdminTabs permissions={me.data?.permissions ?? []} />
      <Card>
        <CardHeader title="Materiality thresholds" />
        <CardBody>{settings.isPending ? <LoadingState /> : settings.isError ? <ErrorState error={settings.error} /> : <MaterialityForm settings={settings.data} />}</CardBody>
      </Card>
    </>
  );
}
