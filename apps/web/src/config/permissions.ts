import { permissions, rolesWith, type Permission } from "@plumeline/contracts";

export type { Permission };

/** "the analyst or actuary role", "any signed-in role": who holds a permission, in words. */
function holdersInWords(permission: Permission): string {
  const holders = rolesWith(permission);
  if (holders.length === 4) return "any signed-in role";
  const last = holders.at(-1);
  const rest = holders.slice(0, -1);
  return `the ${rest.length ? `${rest.join(", ")} or ${last}` : last} role`;
}

/**
 * Which role holds a permission, in words, so a refusal can say what would allow it. Derived
 * from the contracts' role table, so the words cannot drift from what the API enforces.
 */
export const PERMISSION_HOLDERS = Object.fromEntries(permissions.map((p) => [p, holdersInWords(p)])) as Record<Permission, string>;
