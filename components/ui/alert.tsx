import clsx from "clsx";
import type { ReactNode } from "react";

export type AlertTone = "info" | "warning" | "danger" | "success";

const tones: Record<AlertTone, { box: string; icon: ReactNode; word: string }> = {
  info: {
    box: "border-teal-200 bg-info-bg text-ink [&_[data-alert-title]]:text-info",
    word: "Note",
    icon: <path d="M8 7.2v4M8 4.6v.3" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />,
  },
  warning: {
    box: "border-[#ead4a4] bg-warning-bg text-ink [&_[data-alert-title]]:text-warning",
    word: "Warning",
    icon: <path d="M8 4.6v4M8 11v.3" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />,
  },
  danger: {
    box: "border-[#efc2c7] bg-danger-bg text-ink [&_[data-alert-title]]:text-danger",
    word: "Error",
    icon: <path d="m5.6 5.6 4.8 4.8m0-4.8-4.8 4.8" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />,
  },
  success: {
    box: "border-[#c3ddc8] bg-success-bg text-ink [&_[data-alert-title]]:text-success",
    word: "Done",
    icon: <path d="m5 8.2 2 2 4-4.4" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />,
  },
};

const iconColour: Record<AlertTone, string> = {
  info: "text-info",
  warning: "text-warning",
  danger: "text-danger",
  success: "text-success",
};

/**
 * A message box. danger defaults to role="alert" (announced at once); success to role="status".
 * info and warning are plain page content unless you pass role. A title is shown when given;
 * otherwise the tone's word ("Warning", "Error") is read out, so meaning never rests on colour.
 */
export function Alert({
  tone = "info",
  title,
  children,
  role,
  className,
}: {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  role?: "alert" | "status" | "note" | null;
  className?: string;
}) {
  const t = tones[tone];
  const resolvedRole = role === null ? undefined : (role ?? (tone === "danger" ? "alert" : tone === "success" ? "status" : undefined));
  return (
    <div role={resolvedRole} className={clsx("rounded-card flex gap-3 border px-4 py-3 text-[0.9375rem]", t.box, className)}>
      <svg viewBox="0 0 16 16" className={clsx("mt-0.5 size-5 shrink-0", iconColour[tone])} aria-hidden="true">
        <circle cx="8" cy="8" r="7" fill="none" stroke="currentColor" strokeWidth="1.3" />
        {t.icon}
      </svg>
      <div className="min-w-0 space-y-1">
        {title ? (
          <p data-alert-title className="font-semibold">
            {title}
          </p>
        ) : (
          <span className="sr-only">{t.word}: </span>
        )}
        {children ? <div className="text-ink [&_a]:underline [&_a]:underline-offset-2">{children}</div> : null}
      </div>
    </div>
  );
}
