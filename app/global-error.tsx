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
          <p className="text-ink font-serif text-lg font-semibold">Gradeline</p>
          <h1 className="mt-10 text-4xl font-semibold tracking-[-0.01em]">Something went wrong on our side</h1>
          <p className="text-ink-2 mt-4 text-lg leading-relaxed">
            The page could not be shown. Try again; if it keeps happening, quote the reference below when you contact us.
          </p>
          {error.digest ? (
            <p className="text-ink-2 mt-4 text-sm">
              Reference <code className="num text-ink">{error.digest}</code>
            </p>
          ) : null}
          <div className="mt-8 flex flex-wrap gap-3">
            <button
              type="button"
              onClick={reset}
              className="bg-teal hover:bg-teal-dark inline-flex h-10 items-center rounded-md px-4 text-[0.9375rem] font-medium text-white"
            >
              Try again
            </button>
            <Link
              href="/"
              className="border-rule-strong text-ink hover:bg-paper-2 inline-flex h-10 items-center rounded-md border bg-white px-4 text-[0.9375rem] font-medium"
            >
              Back to the start
            </Link>
          </div>
        </main>
      </body>
    </html>
  );
}
