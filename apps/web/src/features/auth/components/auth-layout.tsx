import type { ReactNode } from "react";
import { Logo } from "@/components/ui/logo";

/** The signed-out pages (sign in, forgot password, new password): the brand panel beside one narrow form. */
export function AuthLayout({ title, subtitle, children }: { title: string; subtitle: string; children: ReactNode }) {
  return (
    <div className="grid min-h-screen lg:grid-cols-[1.1fr_1fr]">
      <div className="relative hidden overflow-hidden bg-[#0d1f3a] p-12 text-white lg:flex lg:flex-col lg:justify-between">
        <Logo className="text-white" />
        <svg aria-hidden viewBox="0 0 600 320" className="absolute inset-x-0 bottom-24 w-full opacity-90">
          <path d="M0 300 C 180 290, 320 230, 600 40 L 600 200 C 330 280, 180 300, 0 306Z" fill="#e8913d" opacity=".18" />
          <path d="M0 302 C 190 292, 330 250, 600 100 L 600 170 C 340 268, 190 298, 0 304Z" fill="#e8913d" opacity=".35" />
          <path d="M0 303 C 190 295, 335 260, 600 135" stroke="#f6c489" strokeWidth="3" fill="none" />
        </svg>
        <div className="relative max-w-md">
          <p className="text-3xl font-semibold leading-tight">Warming ranges you can defend, under the governance you already answer to.</p>
          <p className="mt-3 text-sm text-white/70">Pathways · versioned model assumptions · reproducible ensembles · peril multipliers</p>
        </div>
      </div>
      <main className="flex items-center justify-center p-6">
        <div className="w-full max-w-sm">
          <Logo className="mb-8 text-ink lg:hidden" />
          <h1 className="text-2xl font-semibold">{title}</h1>
          <p className="mb-6 mt-1 text-sm text-muted">{subtitle}</p>
          {children}
        </div>
      </main>
    </div>
  );
}
