import clsx from "clsx";

export type Severity = 1 | 2 | 3 | 4 | 5;

export const SEVERITY_LABELS: Record<Severity, string> = {
  1: "Sound",
  2: "Minor",
  3: "Moderate",
  4: "Serious",
  5: "Critical",
};

// Literal class names so Tailwind sees them.
const styles: Record<Severity, { chip: string; soft: string; bar: string }> = {
  1: { chip: "bg-sev-1 text-white", soft: "bg-sev-1-bg text-sev-1 border-sev-1/25", bar: "bg-sev-1" },
  2: { chip: "bg-sev-2 text-white", soft: "bg-sev-2-bg text-sev-2 border-sev-2/25", bar: "bg-sev-2" },
  3: { chip: "bg-sev-3 text-white", soft: "bg-sev-3-bg text-sev-3 border-sev-3/25", bar: "bg-sev-3" },
  4: { chip: "bg-sev-4 text-white", soft: "bg-sev-4-bg text-sev-4 border-sev-4/25", bar: "bg-sev-4" },
  5: { chip: "bg-sev-5 text-white", soft: "bg-sev-5-bg text-sev-5 border-sev-5/25", bar: "bg-sev-5" },
};

export function severityLabel(severity: number) {
  return SEVERITY_LABELS[clampSeverity(severity)];
}

function clampSeverity(n: number): Severity {
  return Math.min(5, Math.max(1, Math.round(n))) as Severity;
}

/** Number + word, in the severity colours. Reads "Severity 4 of 5, Serious" to a screen reader. */
export function SeverityBadge({ severity, size = "md", className }: { severity: number; size?: "sm" | "md" | "lg"; className?: string }) {
  const s = clampSeverity(severity);
  return (
    <span
      className={clsx(
        "inline-flex items-center overflow-hidden rounded-md border font-medium whitespace-nowrap",
        styles[s].soft,
        size === "sm" && "text-xs",
        size === "md" && "text-sm",
        size === "lg" && "text-base",
        className,
      )}
    >
      <span
        className={clsx(
          "num self-stretch text-center font-semibold",
          styles[s].chip,
          size === "sm" && "px-1.5 py-px",
          size === "md" && "px-2 py-0.5",
          size === "lg" && "px-3 py-1",
        )}
      >
        <span className="sr-only">Severity </span>
        {s}
        <span className="sr-only"> of 5,</span>
      </span>
      <span className={clsx(size === "sm" ? "px-1.5" : size === "md" ? "px-2" : "px-3")}>{SEVERITY_LABELS[s]}</span>
    </span>
  );
}

/** The whole scale as a legend, optionally marking one step as the current rating. */
export function SeverityScale({ current, className }: { current?: number; className?: string }) {
  const active = current === undefined ? undefined : clampSeverity(current);
  return (
    <ol className={clsx("grid grid-cols-5 gap-1", className)} aria-label="Severity scale, 1 best to 5 worst">
      {([1, 2, 3, 4, 5] as const).map((s) => (
        <li
          key={s}
          aria-current={active === s ? "true" : undefined}
          className={clsx(
            "flex min-w-0 flex-col gap-1.5 rounded-sm border px-1.5 pt-1.5 pb-2 text-xs sm:px-2 sm:text-sm",
            styles[s].soft,
            active === s && "ring-ink ring-offset-paper ring-2 ring-offset-1",
          )}
        >
          <span className={clsx("h-1 rounded-full", styles[s].bar)} aria-hidden="true" />
          <span className="num font-semibold">{s}</span>
          <span className="font-medium">{SEVERITY_LABELS[s]}</span>
        </li>
      ))}
    </ol>
  );
}
