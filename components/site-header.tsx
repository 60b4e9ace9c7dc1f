import Link from "next/link";

import { SkipLink } from "@/components/app-shell";
import { ButtonLink } from "@/components/ui/button";
import { Logo } from "@/components/ui/logo";

const links = [
  { href: "/how-it-works", label: "How it works" },
  { href: "/pricing", label: "Pricing" },
];

const linkClass = "rounded-sm text-[0.9375rem] text-ink-2 underline-offset-4 hover:text-ink hover:underline";

export function SiteHeader() {
  return (
    <>
      <SkipLink />
      <header className="border-rule border-b print:hidden">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-8 gap-y-2 px-4 pt-3 pb-2 sm:h-16 sm:flex-nowrap sm:px-6 sm:py-0">
          <Link href="/" className="rounded-sm">
            <Logo />
            <span className="sr-only">, home</span>
          </Link>
          <nav aria-label="Main" className="order-last w-full sm:order-none sm:w-auto">
            <ul className="border-rule flex items-center gap-6 border-t py-2 sm:border-0 sm:py-0">
              {links.map((l) => (
                <li key={l.href}>
                  <Link href={l.href} className={linkClass}>
                    {l.label}
                  </Link>
                </li>
              ))}
              <li className="ml-auto sm:hidden">
                <Link href="/sign-in" className={linkClass}>
                  Sign in
                </Link>
              </li>
            </ul>
          </nav>
          <div className="ml-auto flex items-center gap-5">
            <Link href="/sign-in" className={`${linkClass} hidden sm:inline`}>
              Sign in
            </Link>
            <ButtonLink href="/sign-up" size="sm">
              Get started
            </ButtonLink>
          </div>
        </div>
      </header>
    </>
  );
}
