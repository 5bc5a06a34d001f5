import { useMe } from "@/features/auth/api/get-me";
import type { PerilViewer } from "@/features/peril/lib/peril-viewer";

/**
 * Who is looking at a peril-lens page, read from the session. It lives in the app layer because
 * it joins two features (auth's session, peril's viewer) that must not import each other.
 */
export function usePerilViewer(): PerilViewer {
  const me = useMe();
  return { userId: me.data?.user.id ?? null, canWrite: me.data?.permissions.includes("perils:write") ?? false };
}
