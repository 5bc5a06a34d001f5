import { createBrowserRouter, type RouteObject } from "react-router-dom";
import { paths, type RouteKey } from "@/config/paths";
import { AppShell } from "./layout/app-shell";
import { RouteErrorBoundary } from "./error-boundary";
import { LoadingState } from "@/components/ui/states";

type PageModule = Promise<{ default: React.ComponentType }>;

/** A lazily loaded page under the shell; the route's permission travels in `handle` for the shell's gate. */
function page(key: RouteKey, load: () => PageModule): RouteObject {
  const def = paths[key] as { path: string; permission?: string; purpose?: string };
  return {
    path: def.path,
    handle: { permission: def.permission, purpose: def.purpose },
    lazy: async () => ({ Component: (await load()).default }),
  };
}

export const routes: RouteObject[] = [
  {
    path: paths.signIn.path,
    lazy: async () => ({ Component: (await import("./routes/sign-in-page")).default }),
    errorElement: <RouteErrorBoundary />,
    HydrateFallback: () => <LoadingState label="Loading…" />,
  },
  {
    path: paths.forgotPassword.path,
    lazy: async () => ({ Component: (await import("./routes/forgot-password-page")).default }),
    errorElement: <RouteErrorBoundary />,
    HydrateFallback: () => <LoadingState label="Loading…" />,
  },
  {
    path: paths.resetPassword.path,
    lazy: async () => ({ Component: (await import("./routes/reset-password-page")).default }),
    errorElement: <RouteErrorBoundary />,
    HydrateFallback: () => <LoadingState label="Loading…" />,
  },
  {
    element: <AppShell />,
    errorElement: <RouteErrorBoundary />,
    HydrateFallback: () => <LoadingState label="Loading…" />,
    children: [
      {
        errorElement: <RouteErrorBoundary />,
        children: [
          page("desk", () => import("./routes/desk-page")),
          page("pathways", () => import("./routes/pathways-page")),
          page("pathwayUpload", () => import("./routes/pathway-upload-page")),
          page("pathwayCompose", () => import("./routes/pathway-compose-page")),
          page("pathway", () => import("./routes/pathway-page")),
          page("modelVersions", () => import("./routes/model-versions-page")),
          page("modelVersionNew", () => import("./routes/model-version-new-page")),
          page("modelVersion", () => import("./routes/model-version-page")),
          page("modelVersionEdit", () => import("./routes/model-version-edit-page")),
          page("modelVersionReview", () => import("./routes/model-version-review-page")),
          page("runs", () => import("./routes/runs-page")),
          page("runNew", () => import("./routes/run-new-page")),
          page("runCompare", () => import("./routes/run-compare-page")),
          page("run", () => import("./routes/run-page")),
          page("perils", () => import("./routes/peril-lens-page")),
          page("perilProfileNew", () => import("./routes/peril-profile-page")),
          page("perilProfile", () => import("./routes/peril-profile-page")),
          page("portfolioUpload", () => import("./routes/portfolio-upload-page")),
          page("portfolio", () => import("./routes/portfolio-page")),
          page("exports", () => import("./routes/exports-page")),
          page("adminUsers", () => import("./routes/admin-users-page")),
          page("adminAudit", () => import("./routes/admin-audit-page")),
          page("adminOutbox", () => import("./routes/admin-outbox-page")),
          page("adminSettings", () => import("./routes/admin-settings-page")),
          { path: "*", lazy: async () => ({ Component: (await import("./routes/not-found-page")).default }) },
        ],
      },
    ],
  },
];

export const router = createBrowserRouter(routes);
