import { roles, type Role } from "./users.js";

/**
 * THE one role -> permission table, shared by the API (which enforces it on every route) and the
 * web app (which shows who may do what). Ownership rules (no self-approval) live in the API's
 * services, not here. docs/API.md lists the routes each permission opens.
 */

/** Every named permission a route can require. */
export const permissions = [
  "pathways:read",
  "pathways:write",
  "model-versions:read",
  "model-versions:write",
  "model-versions:decide",
  "runs:read",
  "runs:create",
  "exports:create",
  "perils:read",
  "perils:write",
  "audit:read",
  "users:manage",
  "outbox:read",
  "settings:manage",
] as const;
export type Permission = (typeof permissions)[number];

export const permissionsByRole: Record<Role, readonly Permission[]> = {
  analyst: [
    "pathways:read",
    "pathways:write",
    "model-versions:read",
    "model-versions:write",
    "runs:read",
    "runs:create",
    "exports:create",
    "perils:read",
    "perils:write",
  ],
  actuary: [
    "pathways:read",
    "model-versions:read",
    "runs:read",
    "runs:create",
    "exports:create",
    "perils:read",
    "perils:write",
  ],
  manager: [
    "pathways:read",
    "model-versions:read",
    "model-versions:decide",
    "runs:read",
    "exports:create",
    "perils:read",
    "audit:read",
  ],
  admin: [
    "pathways:read",
    "model-versions:read",
    "runs:read",
    "perils:read",
    "audit:read",
    "users:manage",
    "outbox:read",
    "settings:manage",
  ],
};

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (roles as readonly string[]).includes(value);
}

export function hasPermission(role: Role, permission: Permission): boolean {
  return permissionsByRole[role].includes(permission);
}

export function permissionsOf(role: Role): Permission[] {
  return [...permissionsByRole[role]];
}

/** The roles that hold a permission, in the order of `roles`. */
export function rolesWith(permission: Permission): Role[] {
  return roles.filter((role) => hasPermission(role, permission));
}
