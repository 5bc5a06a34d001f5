import type { Permission } from "./permissions";

/**
 * Every route of the app in one table: the pattern the router mounts, a builder that
 * produces links (so no feature spells a URL by hand), the permission the page needs and
 * the sentence shown when a user without it opens the URL directly.
 */
interface RouteDef<A extends unknown[] = []> {
  path: string;
  build: (...args: A) => string;
  permission?: Permission;
  /** Completes "… needs the X role": what the page is for. */
  purpose?: string;
}

const route = <A extends unknown[]>(def: RouteDef<A>) => def;
const qs = (params: Record<string, string | undefined>) => {
  const s = new URLSearchParams(Object.entries(params).filter((e): e is [string, string] => Boolean(e[1]))).toString();
  return s ? `?${s}` : "";
};

export const paths = {
  signIn: route({
    path: "/sign-in",
    build: (next?: string, expired?: boolean, passwordReset?: boolean) =>
      `/sign-in${qs({ next, expired: expired ? "1" : undefined, reset: passwordReset ? "1" : undefined })}`,
  }),
  // Signed-out pages of the mailed password reset; the API's mail links to resetPassword with ?token=.
  forgotPassword: route({ path: "/forgot-password", build: () => "/forgot-password" }),
  resetPassword: route({ path: "/reset-password", build: (token?: string) => `/reset-password${qs({ token })}` }),
  desk: route({ path: "/", build: () => "/" }),

  pathways: route({ path: "/pathways", build: () => "/pathways", permission: "pathways:read", purpose: "Reading pathways" }),
  pathwayUpload: route({ path: "/pathways/upload", build: () => "/pathways/upload", permission: "pathways:write", purpose: "Uploading pathways" }),
  pathwayCompose: route({
    path: "/pathways/compose",
    // mode "json": the advanced editor of the pathway as raw JSON; otherwise the step composer.
    build: (fromId?: string, mode?: "json") => `/pathways/compose${qs({ from: fromId, mode })}`,
    permission: "pathways:write",
    purpose: "Composing pathways",
  }),
  pathway: route({ path: "/pathways/:pathwayId", build: (id: string) => `/pathways/${id}`, permission: "pathways:read", purpose: "Reading pathways" }),

  modelVersions: route({ path: "/model-versions", build: (status?: string) => `/model-versions${qs({ status })}`, permission: "model-versions:read", purpose: "Reading model versions" }),
  modelVersionNew: route({
    path: "/model-versions/new",
    build: (fromId?: string) => `/model-versions/new${qs({ from: fromId })}`,
    permission: "model-versions:write",
    purpose: "Drafting model versions",
  }),
  modelVersion: route({ path: "/model-versions/:versionId", build: (id: string) => `/model-versions/${id}`, permission: "model-versions:read", purpose: "Reading model versions" }),
  modelVersionEdit: route({ path: "/model-versions/:versionId/edit", build: (id: string) => `/model-versions/${id}/edit`, permission: "model-versions:write", purpose: "Editing model versions" }),
  modelVersionReview: route({
    path: "/model-versions/:versionId/review",
    build: (id: string) => `/model-versions/${id}/review`,
    permission: "model-versions:decide",
    purpose: "Approving model versions",
  }),

  runs: route({ path: "/runs", build: () => "/runs", permission: "runs:read", purpose: "Reading runs" }),
  runNew: route({ path: "/runs/new", build: (versionId?: string) => `/runs/new${qs({ version: versionId })}`, permission: "runs:create", purpose: "Starting runs" }),
  runCompare: route({
    path: "/runs/compare",
    // The run ids in the address (?runs=a,b,c), so a comparison can be bookmarked and shared.
    build: (...runIds: string[]) => `/runs/compare${runIds.length ? `?runs=${runIds.map(encodeURIComponent).join(",")}` : ""}`,
    permission: "runs:read",
    purpose: "Comparing runs",
  }),
  run: route({ path: "/runs/:runId", build: (id: string) => `/runs/${id}`, permission: "runs:read", purpose: "Reading runs" }),

  perils: route({ path: "/peril-lens", build: () => "/peril-lens", permission: "perils:read", purpose: "The peril lens" }),
  perilProfileNew: route({ path: "/peril-lens/profiles/new", build: () => "/peril-lens/profiles/new", permission: "perils:write", purpose: "Writing peril profiles" }),
  perilProfile: route({ path: "/peril-lens/profiles/:profileId", build: (id: string) => `/peril-lens/profiles/${id}`, permission: "perils:read", purpose: "The peril lens" }),
  portfolioUpload: route({ path: "/peril-lens/portfolios/upload", build: () => "/peril-lens/portfolios/upload", permission: "perils:write", purpose: "Uploading portfolios" }),
  portfolio: route({ path: "/peril-lens/portfolios/:portfolioId", build: (id: string) => `/peril-lens/portfolios/${id}`, permission: "perils:read", purpose: "The peril lens" }),

  exports: route({ path: "/exports", build: () => "/exports", permission: "runs:read", purpose: "Reading exports" }),

  adminUsers: route({ path: "/admin/users", build: () => "/admin/users", permission: "users:manage", purpose: "Managing users and roles" }),
  adminAudit: route({ path: "/admin/audit", build: () => "/admin/audit", permission: "audit:read", purpose: "Reading the audit log" }),
  adminSettings: route({ path: "/admin/review-policy", build: () => "/admin/review-policy", permission: "settings:manage", purpose: "Setting the review policy" }),
  adminOutbox: route({ path: "/admin/outbox", build: (id?: string) => `/admin/outbox${qs({ message: id })}`, permission: "outbox:read", purpose: "Reading the outbox" }),
} as const;

export type RouteKey = keyof typeof paths;
