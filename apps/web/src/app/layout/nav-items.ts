import { paths } from "@/config/paths";
import type { Permission } from "@/config/permissions";

export interface NavItem {
  label: string;
  to: string;
  /** Any one of these makes the item visible. */
  anyOf: Permission[];
  icon: string;
  end?: boolean;
  /** Where the link goes, by permission, when the area has several pages (first match wins). */
  targets?: Array<[Permission, string]>;
}

/** Plumeline's own vocabulary for the places in the app. */
export const NAV_ITEMS: NavItem[] = [
  { label: "Desk", to: paths.desk.build(), anyOf: [], icon: "M3 11h18M5 11v8h14v-8M8 7h8", end: true },
  { label: "Pathways", to: paths.pathways.build(), anyOf: ["pathways:read"], icon: "M3 18c5-1 9-5 18-12M3 20h18" },
  { label: "Model versions", to: paths.modelVersions.build(), anyOf: ["model-versions:read"], icon: "M6 4h9l3 3v13H6zM9 10h6M9 14h6" },
  { label: "Runs", to: paths.runs.build(), anyOf: ["runs:read"], icon: "M4 18c4-1 8-4 16-12M4 18c5 0 10-2 16-6M4 18h16" },
  { label: "Peril lens", to: paths.perils.build(), anyOf: ["perils:read"], icon: "M12 3l8 14H4zM12 10v3M12 15.5v.5" },
  { label: "Exports", to: paths.exports.build(), anyOf: ["runs:read"], icon: "M12 4v11M7 10l5 5 5-5M5 20h14" },
  {
    label: "Admin",
    to: paths.adminUsers.build(),
    anyOf: ["users:manage", "audit:read", "outbox:read", "settings:manage"],
    icon: "M12 3l7 3v5c0 5-3 8-7 10-4-2-7-5-7-10V6z",
    targets: [
      ["users:manage", paths.adminUsers.build()],
      ["audit:read", paths.adminAudit.build()],
      ["outbox:read", paths.adminOutbox.build()],
      ["settings:manage", paths.adminSettings.build()],
    ],
  },
];

/** The items a role may use, each pointing at the first page of its area the role may open. */
export function visibleNavItems(permissions: readonly string[]): NavItem[] {
  return NAV_ITEMS.filter((item) => item.anyOf.length === 0 || item.anyOf.some((p) => permissions.includes(p))).map((item) => {
    const target = item.targets?.find(([p]) => permissions.includes(p));
    return target ? { ...item, to: target[1] } : item;
  });
}
