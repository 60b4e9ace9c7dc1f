import clsx from "clsx";
import type { ReactNode } from "react";

export function EmptyState({
  title,
  description,
  action,
  as: H = "h2",
  className,
}: {
  title: ReactNode;
  description?: ReactNode;
  action?: ReactNode;
  as?: "h2" | "h3";
  className?: string;
}) {
  return (
    <div className={clsx("rounded-card border-rule-strong/60 bg-paper border border-dashed px-6 py-12 text-center", className)}>
      <svg viewBox="0 0 64 24" className="text-copper mx-auto mb-4 h-6 w-16" aria-hidden="true">
        <path d="M2 8h60" stroke="currentColor" strokeOpacity="0.35" strokeWidth="1" />
        <path d="M6 12 58 17" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round" />
        <path d="M12 23v-3M32 23v-3M52 23v-3" stroke="currentColor" strokeOpacity="0.6" strokeWidth="1.2" />
      </svg>
      <H className="text-lg font-semibold">{title}</H>
      {description ? <div className="text-ink-2 mx-auto mt-2 max-w-[52ch] text-[0.9375rem]">{description}</div> : null}
      {action ? <div className="mt-6 flex flex-wrap justify-center gap-2">{action}</div> : null}
    </div>
  );
}
