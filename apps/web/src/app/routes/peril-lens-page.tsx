import { useMe } from "@/features/auth/api/get-me";
import { PerilLensRoute } from "@/features/peril/routes/peril-lens";

/** Peril profiles and portfolio baselines; the feature owns the page, the app passes who is looking. */
export default function PerilLensPage() {
  const me = useMe();
  return <PerilLensRoute viewer={{ userId: me.data?.user.id ?? null, canWrite: me.data?.permissions.includes("perils:write") ?? false }} />;
}
