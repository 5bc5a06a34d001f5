import type { Permission } from "@/config/permissions";
import { useMe } from "./api/get-me";

/** True when the signed-in user holds the permission (false while unknown). */
export function useCan(permission: Permission | undefined): boolean {
  const me = useMe();
  if (!permission) return true;
  return me.data?.permissions.includes(permission) ?? false;
}
