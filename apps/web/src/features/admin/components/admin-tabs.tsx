import { NavLink } from "react-router-dom";
import { paths } from "@/config/paths";
import { cx } from "@/components/ui/cx";

/** Sub-navigation of the admin area, showing only the parts the role may open. */
export function AdminTabs({ permissions }: { permissions: readonly string[] }) {
  const tabs = [
    { to: paths.adminUsers.build(), label: "Users and roles", permission: "users:manage" },
    { to: paths.adminAudit.build(), label: "Audit log", permission: "audit:read" },
    { to: paths.adminOutbox.build(), label: "Outbox", permission: "outbox:read" },
    { to: paths.adminSettings.build(), label: "Review policy", permission: "settings:manage" },
  ].filter((t) => permissions.includes(t.permission));
  return (
    <nav aria-label="Admin" className="mb-5 flex gap-1 border-b border-line">
      {tabs.map((t) => (
        <NavLink
          key={t.to}
          to={t.to}
          className={({ isActive }) =>
            cx("-mb-px border-b-2 px-3 py-2 text-sm", isActive ? "border-ember-600 font-medium text-ink" : "border-transparent text-muted hover:text-ink")
          }
        >
          {t.label}
        </NavLink>
      ))}
    </nav>
  );
}
