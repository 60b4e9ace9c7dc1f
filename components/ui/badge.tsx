import clsx from "clsx";
import type { ComponentProps } from "react";

export type BadgeTone = "neutral" | "teal" | "copper" | "outline" | "danger" | "warning" | "success";

const tones: Record<BadgeTone, string> = {
  neutral: "bg-paper-2 text-ink-2 border-rule",
  teal: "bg-teal-50 text-teal-800 border-teal-200",
  copper: "bg-copper-light text-copper-dark border-[#ebd0bc]",
  outline: "bg-transparent text-ink-2 border-rule-strong",
  danger: "bg-danger-bg text-danger border-[#f1c9cd]",
  warning: "bg-warning-bg text-warning border-[#efdcb2]",
  success: "bg-success-bg text-success border-[#c6dfcb]",
};

export function Badge({ tone = "neutral", className, ...props }: ComponentProps<"span"> & { tone?: BadgeTone }) {
  return (
    <span
      className={clsx(
        "inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-xs leading-5 font-medium whitespace-nowrap",
        tones[tone],
        className,
      )}
      {...props}
    />
  );
}
