import clsx from "clsx";
import type { ComponentProps } from "react";

import { controlClasses } from "./input";

// A native <select> (best on phones) with our own chevron.
export function Select({ className, children, ...props }: ComponentProps<"select">) {
  return (
    <div className="relative">
      <select className={clsx(controlClasses, "h-10 appearance-none pr-9", className)} {...props}>
        {children}
      </select>
      <svg
        viewBox="0 0 16 16"
        className="text-ink-2 pointer-events-none absolute top-1/2 right-3 size-4 -translate-y-1/2"
        aria-hidden="true"
      >
        <path d="m4 6 4 4 4-4" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" strokeLinejoin="round" />
      </svg>
    </div>
  );
}
