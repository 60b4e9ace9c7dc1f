"use client";

import Link from "next/link";
import { useEffect } from "react";

import { fontVariables } from "./fonts";

import "./globals.css";

// Replaces the root layout when it fails, so it brings its own html, body, fonts and styles.
export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);

  return (
    <html lang="en" className={fontVariables}>
      <body className="min-h-dvh">
        <main className="mx-auto max-w-2xl px-4 py-24 sm:px-6">
          <p className="font-serif text-lg font-semibold text-ink">Gradeline</p>
          <h1 className="mt-10 text-4xl font-semibold tracking-[-0.01em]">Something went wrong on our side</h1>
          <p className="mt-4 text-lg leading-relaxed text-ink-2">
            The page could not be shown. Try again; if it keeps happening, quote the reference below when you contact
            us.
          </p>
          {error.digest ? (
            <p className="mt-4 text-sm text-ink-2">
              Reference <code className="num text-ink">{error.digest}</code>
            </p>
          ) : null}
          <div className="mt-8 flex flex-wrap gap-3">
            <button
              type="button"
              onClick={reset}
              className="inline-flex h-10 items-center rounded-md bg-teal px-4 text-[0.9375rem] font-medium text-white hover:bg-teal-dark"
            >
              Try again
            </button>
            <Link
              href="/"
              className="inline-flex h-10 items-center rounded-md border border-rule-strong bg-white px-4 text-[0.9375rem] font-medium text-ink hover:bg-paper-2"
            >
              Back to the start
            </Link>
          </div>
        </main>
      </body>
    </html>
  );
}
