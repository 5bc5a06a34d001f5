/** Permission names exactly as the API's role table states them (docs/API.md). */
export type Permission =
  | "pathways:read"
  | "pathways:write"
  | "model-versions:read"
  | "model-versions:write"
  | "model-versions:decide"
  | "runs:read"
  | "runs:create"
  | "exports:create"
  | "perils:read"
  | "perils:write"
  | "audit:read"
  | "users:manage"
  | "outbox:read";

/** Which role holds a permission, in words, so a refusal can say what would allow it. */
export const PERMISSION_HOLDERS: Record<Permission, string> = {
  "pathways:read": "any signed-in role",
  "pathways:write": "the analyst role",
  "model-versions:read": "any signed-in role",
  "model-versions:write": "the analyst role",
  "model-versions:decide": "the manager role",
  "runs:read": "any signed-in role",
  "runs:create": "the analyst or actuary role",
  "exports:create": "the analyst, actuary or manager role",
  "perils:read": "any signed-in role",
  "perils:write": "the analyst or actuary role",
  "audit:read": "the manager or admin role",
  "users:manage": "the admin role",
  "outbox:read": "the admin role",
};
