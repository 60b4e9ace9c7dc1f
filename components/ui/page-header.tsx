import clsx from "clsx";
import Link from "next/link";
import type { ReactNode } from "react";

/** The h1 of a page, with an optional eyebrow line, back link, description and actions. */
export function PageHeader({
  title,
  description,
  actions,
  eyebrow,
  back,
  className,
}: {
  title: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  eyebrow?: ReactNode;
  back?: { href: string; label: string };
  className?: string;
}) {
  return (
    <header className={clsx("border-rule mb-8 border-b pb-6", className)}>
      {back ? (
        <Link
          href={back.href}
          className="text-ink-2 hover:text-teal mb-3 inline-flex items-center gap-1 text-sm underline-offset-4 hover:underline"
        >
          <span aria-hidden="true">←</span> {back.label}
        </Link>
      ) : null}
      <div className="flex flex-wrap items-end justify-between gap-x-6 gap-y-4">
        <div className="min-w-0 space-y-2">
          {eyebrow ? <p className="text-copper text-xs font-semibold tracking-[0.12em] uppercase">{eyebrow}</p> : null}
          <h1 className="text-3xl leading-tight font-semibold tracking-[-0.01em] sm:text-[2.125rem]">{title}</h1>
          {description ? <div className="text-ink-2 max-w-[68ch] text-[0.9375rem]">{description}</div> : null}
        </div>
        {actions ? <div className="flex flex-wrap items-center gap-2">{actions}</div> : null}
      </div>
    </header>
  );
}
