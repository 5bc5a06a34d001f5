import { Suspense, useEffect } from "react";
import { Navigate, NavLink, Outlet, useLocation, useMatches, useNavigate } from "react-router-dom";
import { useQueryClient } from "@tanstack/react-query";
import { paths } from "@/config/paths";
import { PERMISSION_HOLDERS, type Permission } from "@/config/permissions";
import { onUnauthorized } from "@/lib/api-client";
import { isApiError } from "@/lib/api-error";
import { getMeQueryOptions, useMe } from "@/features/auth/api/get-me";
import { useSignOut } from "@/features/auth/api/sign-in";
import { Logo } from "@/components/ui/logo";
import { RoleBadge } from "@/components/ui/badges";
import { ErrorState, LoadingState } from "@/components/ui/states";
import { ThemeToggle } from "@/components/ui/theme-toggle";
import { cx } from "@/components/ui/cx";
import { visibleNavItems } from "./nav-items";
import { Forbidden } from "./forbidden";
import { ChangePasswordForm } from "@/features/auth/components/change-password-form";

export interface RouteHandle {
  permission?: Permission;
  purpose?: string;
}

/** Signed-in frame: navigation filtered by permissions, a permission gate for the matched route. */
export function AppShell() {
  const me = useMe();
  const location = useLocation();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const signOut = useSignOut();
  const matches = useMatches();

  // A 401 after we had a session means it ended: back to sign-in, remembering where we were.
  // (A visitor who never signed in is sent to sign-in below, without the "session ended" note.)
  useEffect(
    () =>
      onUnauthorized(() => {
        if (!queryClient.getQueryData(getMeQueryOptions().queryKey)) return;
        queryClient.clear();
        void navigate(paths.signIn.build(location.pathname + location.search, true), { replace: true });
      }),
    [navigate, queryClient, location.pathname, location.search],
  );

  if (me.isPending) return <LoadingState label="Checking your session…" className="min-h-screen justify-center" />;
  if (me.isError) {
    if (isApiError(me.error) && me.error.status === 401)
      return <Navigate to={paths.signIn.build(location.pathname === "/" ? undefined : location.pathname + location.search)} replace />;
    return (
      <div className="p-8">
        <ErrorState error={me.error} retry={() => me.refetch()} />
      </div>
    );
  }

  if (me.data.mustChangePassword) return <ChangePasswordForm />;
  const { user, permissions } = me.data;
  const gate = [...matches].reverse().find((m) => (m.handle as RouteHandle | undefined)?.permission)?.handle as RouteHandle | undefined;
  const allowed = !gate?.permission || permissions.includes(gate.permission);

  return (
    <div className="min-h-screen lg:grid lg:grid-cols-[15rem_1fr]">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-surface focus:px-3 focus:py-2">
        Skip to content
      </a>
      <aside className="flex flex-col bg-[#0d1f3a] text-white lg:sticky lg:top-0 lg:h-screen">
        <div className="px-5 pb-4 pt-5">
          <Logo className="text-white" />
        </div>
        <nav aria-label="Main" className="flex gap-1 overflow-x-auto px-3 lg:flex-1 lg:flex-col">
          {visibleNavItems(permissions).map((item) => (
            <NavLink
              key={item.label}
              to={item.to}
              end={item.end}
              className={({ isActive }) =>
                cx(
                  "flex items-center gap-2.5 rounded-md px-3 py-2 text-sm transition-colors",
                  isActive ? "bg-white/12 font-medium text-white shadow-[inset_3px_0_0_#e8913d]" : "text-white/70 hover:bg-white/6 hover:text-white",
                )
              }
            >
              <svg aria-hidden viewBox="0 0 24 24" className="h-4 w-4 shrink-0" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" strokeLinecap="round">
                <path d={item.icon} />
              </svg>
              {item.label}
            </NavLink>
          ))}
        </nav>
        <div className="hidden border-t border-white/10 px-4 py-4 lg:block">
          <p className="truncate text-sm font-medium" title={user.email}>
            {user.name}
          </p>
          <div className="mt-1 flex items-center justify-between">
            <span className="rounded bg-white/10 px-1.5 py-0.5 font-mono text-[11px] uppercase tracking-wider text-white/80">{user.role}</span>
            <ThemeToggle />
          </div>
          <button
            type="button"
            className="mt-3 w-full rounded-md border border-white/20 px-3 py-1.5 text-sm text-white/80 hover:bg-white/10"
            onClick={() => signOut.mutate(undefined, { onSettled: () => void navigate(paths.signIn.build(), { replace: true }) })}
          >
            Sign out
          </button>
        </div>
        <div className="flex items-center justify-between border-t border-white/10 px-4 py-2 lg:hidden">
          <RoleBadge role={user.role} />
          <ThemeToggle />
          <button type="button" className="text-sm text-white/80" onClick={() => signOut.mutate(undefined, { onSettled: () => void navigate(paths.signIn.build()) })}>
            Sign out
          </button>
        </div>
      </aside>
      <main id="main" className="min-w-0 px-5 py-6 lg:px-10 lg:py-8">
        <div className="mx-auto max-w-[88rem]">
          {allowed ? (
            <Suspense fallback={<LoadingState label="Loading page…" />}>
              <Outlet />
            </Suspense>
          ) : (
            <Forbidden purpose={gate?.purpose} holders={gate?.permission ? PERMISSION_HOLDERS[gate.permission] : undefined} role={user.role} />
          )}
        </div>
      </main>
    </div>
  );
}
