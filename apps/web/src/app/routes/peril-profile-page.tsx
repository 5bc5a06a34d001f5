import { useMe } from "@/features/auth/api/get-me";
import { PerilProfileEditorRoute } from "@/features/peril/routes/peril-profile-editor";

export default function PerilProfilePage() {
  const me = useMe();
  return <PerilProfileEditorRoute viewer={{ userId: me.data?.user.id ?? null, canWrite: me.data?.permissions.includes("perils:write") ?? false }} />;
}
