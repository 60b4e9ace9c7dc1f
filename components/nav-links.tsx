"use client";

import clsx from "clsx";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { useId, useState, type ReactNode } from "react";

export type NavItem = { href: string; label: string };

// The item whose href is the longest prefix of the path is current ("/agent" vs "/agent/orders").
function currentHref(pathname: string, items: NavItem[]) {
  let best: string | null = null;
  for (const { href } of items) {
    const hit = pathname === href || pathname.startsWith(href.endsWith("/") ? href : `${href}/`);
    if (hit && (best === null || href.length > best.length)) best = href;
  }
  return best;
}

export function NavLinks({ items }: { items: NavItem[] }) {
  const current = currentHref(usePathname() ?? "", items);
  return (
    <ul className="flex h-full items-stretch gap-1">
      {items.map((item) => {
        const active = item.href === current;
        return (
          <li key={item.href} className="flex">
            <Link
              href={item.href}
              aria-current={active ? "page" : undefined}
              className={clsx(
                "-mb-px flex items-center border-b-2 px-2 text-sm whitespace-nowrap transition-colors xl:px-3",
                active ? "border-copper text-ink font-medium" : "text-ink-2 hover:border-rule-strong hover:text-ink border-transparent",
              )}
            >
              {item.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}

/** Phone menu: a disclosure button that opens the nav and the account block. Closes on navigation and Escape. */
export function MobileNav({ items, account, className }: { items: NavItem[]; account: ReactNode; className?: string }) {
  const pathname = usePathname() ?? "";
  // Open "for" one path: navigating elsewhere closes it without an effect.
  const [openAt, setOpenAt] = useState<string | null>(null);
  const open = openAt === pathname;
  const panelId = useId();
  const current = currentHref(pathname, items);

  return (
    <div className={className} onKeyDown={(e) => e.key === "Escape" && setOpenAt(null)}>
      <button
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpenAt(open ? null : pathname)}
        className="border-rule-strong text-ink inline-flex h-10 items-center gap-2 rounded-md border bg-white px-3 text-sm font-medium"
      >
        <svg viewBox="0 0 16 16" className="size-4" aria-hidden="true">
          {open ? (
            <path d="m4 4 8 8m0-8-8 8" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
          ) : (
            <path d="M2.5 4.5h11M2.5 8h11M2.5 11.5h11" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
          )}
        </svg>
        Menu
      </button>
      <div
        id={panelId}
        hidden={!open}
        className="border-rule bg-paper absolute inset-x-0 top-full border-b px-4 pt-2 pb-5 shadow-[0_12px_24px_-16px_rgb(27_36_34/0.35)]"
      >
        <nav aria-label="Main">
          <ul className="divide-rule border-rule divide-y border-b">
            {items.map((item) => {
              const active = item.href === current;
              return (
                <li key={item.href}>
                  <Link
                    href={item.href}
                    aria-current={active ? "page" : undefined}
                    onClick={() => setOpenAt(null)}
                    className={clsx("flex min-h-12 items-center gap-3 py-2 text-base", active ? "text-ink font-medium" : "text-ink-2")}
                  >
                    <span className={clsx("h-5 w-0.5 rounded-full", active ? "bg-copper" : "bg-transparent")} aria-hidden="true" />
                    {item.label}
                  </Link>
                </li>
              );
            })}
          </ul>
        </nav>
        <div className="pt-4">{account}</div>
      </div>
    </div>
  );
}
