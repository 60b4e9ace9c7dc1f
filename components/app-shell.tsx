import clsx from "clsx";
import Link from "next/link";
import type { ReactNode } from "react";

import { MobileNav, NavLinks, type NavItem } from "@/components/nav-links";
import { SignOutButton } from "@/components/sign-out-button";
import { buttonClasses } from "@/components/ui/button";
import { Logo } from "@/components/ui/logo";

export type ShellUser = { name: string; email: string; role: "agent" | "inspector" | "buyer" | "admin" };

export const ROLE_LABELS: Record<ShellUser["role"], string> = {
  agent: "Buyer's agent",
  inspector: "Inspector",
  buyer: "Home buyer",
  admin: "Admin",
};

export function SkipLink() {
  return (
    <a
      href="#main"
      className="bg-teal sr-only z-50 rounded-md px-4 py-2 text-sm font-medium text-white focus:not-sr-only focus:fixed focus:top-3 focus:left-3"
    >
      Skip to content
    </a>
  );
}

/** The signed-in frame: top bar with logo, role nav and account; a phone menu below lg; main with a max width. */
export function AppShell({ user, nav, homeHref, children }: { user: ShellUser; nav: NavItem[]; homeHref?: string; children: ReactNode }) {
  const role = ROLE_LABELS[user.role];
  // A long menu (the admin's) leaves no room for the name beside it until the widest screens.
  const crowded = nav.length > 6;
  return (
    <div className="flex min-h-dvh flex-col">
      <SkipLink />
      <header className="border-rule bg-paper relative z-30 border-b print:hidden">
        <div className="mx-auto flex h-15 max-w-6xl items-stretch gap-6 px-4 sm:px-6 xl:gap-8">
          <Link href={homeHref ?? nav[0]?.href ?? "/"} className="flex items-center self-center rounded-sm">
            <Logo />
            <span className="sr-only">, home</span>
          </Link>
          <nav aria-label="Main" className="hidden lg:block">
            <NavLinks items={nav} />
          </nav>
          <div className="ml-auto hidden items-center gap-4 lg:flex">
            <p className={clsx("text-right text-sm leading-tight whitespace-nowrap", crowded && "hidden xl:block")}>
              <span className="text-ink block font-medium">{user.name}</span>
              <span className="text-ink-2 block text-xs">{role}</span>
            </p>
            <SignOutButton className={buttonClasses({ variant: "secondary", size: "sm" })} />
          </div>
          <MobileNav
            className="ml-auto flex items-center lg:hidden"
            items={nav}
            account={
              <div className="flex items-center justify-between gap-4">
                <p className="min-w-0 text-sm leading-snug">
                  <span className="text-ink block truncate font-medium">{user.name}</span>
                  <span className="text-ink-2 block truncate">
                    {role} · {user.email}
                  </span>
                </p>
                <SignOutButton className={buttonClasses({ variant: "secondary", size: "md" })} />
              </div>
            }
          />
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 outline-none sm:px-6 sm:py-10">
        {children}
      </main>
    </div>
  );
}
