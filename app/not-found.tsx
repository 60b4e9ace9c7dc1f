import Link from "next/link";

import { SkipLink } from "@/components/app-shell";
import { ButtonLink } from "@/components/ui/button";
import { Logo } from "@/components/ui/logo";

export default function NotFound() {
  return (
    <div className="flex min-h-dvh flex-col">
      <SkipLink />
      <header className="border-rule border-b">
        <div className="mx-auto flex h-16 max-w-6xl items-center px-4 sm:px-6">
          <Link href="/" className="rounded-sm">
            <Logo />
            <span className="sr-only">, home</span>
          </Link>
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-20 outline-none sm:px-6 sm:py-28">
        <p className="num text-copper text-sm">404</p>
        <h1 className="mt-3 text-4xl font-semibold tracking-[-0.01em]">The camera stopped here</h1>
        <p className="text-ink-2 mt-4 max-w-[52ch] text-lg leading-relaxed">
          There is no page at this address, or it has moved. If you followed a link to a report, it may have been withdrawn or you may need
          to sign in with the account it was shared with.
        </p>
        <div className="mt-8 flex flex-wrap gap-3">
          <ButtonLink href="/">Back to the start</ButtonLink>
          <ButtonLink href="/sign-in" variant="secondary">
            Sign in
          </ButtonLink>
        </div>
      </main>
    </div>
  );
}
