import Link from "next/link";

import { LogoMark } from "@/components/ui/logo";

export function SiteFooter() {
  return (
    <footer className="border-rule bg-paper-2/50 mt-16 border-t print:hidden">
      <div className="mx-auto grid max-w-6xl gap-10 px-4 py-12 sm:px-6 md:grid-cols-[1fr_2fr]">
        <div className="space-y-3">
          <p className="flex items-center gap-2 font-serif text-lg font-semibold">
            <LogoMark className="size-6" /> Gradeline
          </p>
          <p className="text-ink-2 text-sm">Pre-purchase sewer scopes, from order to rated summary.</p>
          <nav aria-label="Footer">
            <ul className="flex flex-wrap gap-x-5 gap-y-2 pt-2 text-sm">
              {[
                ["/how-it-works", "How it works"],
                ["/pricing", "Pricing"],
                ["/sign-in", "Sign in"],
                ["/sign-up", "Get started"],
              ].map(([href, label]) => (
                <li key={href}>
                  <Link href={href} className="text-ink-2 hover:text-ink underline underline-offset-4">
                    {label}
                  </Link>
                </li>
              ))}
            </ul>
          </nav>
        </div>
        <div className="text-ink-2 md:border-rule space-y-3 text-sm leading-relaxed md:border-l md:pl-10">
          <p>
            A sewer scope records what a camera saw inside the line on one day; it is not a warranty. Footages and locator depths are
            approximate. Call 811 before anyone digs. Repairs are decided by local codes and licensed contractors, and every cost range on
            Gradeline is an estimate for negotiation, not a quote.
          </p>
          <p>
            Prices and examples on these pages are for the demo market of Harrow Falls; every place, person and report in the demo is
            invented.
          </p>
          <p className="pt-2 text-xs">© Gradeline</p>
        </div>
      </div>
    </footer>
  );
}
