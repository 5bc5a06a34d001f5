import { createAccessControl } from "better-auth/plugins/access";
import { adminAc, defaultStatements } from "better-auth/plugins/admin/access";

/**
 * better-auth's admin plugin checks its own statements (user:create, user:set-role, …) on
 * its endpoints. Our four roles are declared to it here; only `admin` holds the plugin's
 * statements, so only admins can use /api/auth/admin/*. Plumeline's own permissions are
 * checked by middleware/require-permission.ts against the contracts' role table (permissions.ts).
 */
export const accessControl = createAccessControl({ ...defaultStatements });

export const authRoles = {
  analyst: accessControl.newRole({ user: [], session: [] }),
  actuary: accessControl.newRole({ user: [], session: [] }),
  manager: accessControl.newRole({ user: [], session: [] }),
  admin: accessControl.newRole({ ...adminAc.statements }),
};
