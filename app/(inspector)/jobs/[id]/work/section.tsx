"use client";

import clsx from "clsx";
import type { ReactNode } from "react";

import { Button } from "@/components/ui/button";

import type { SectionId } from "./problem-fields";

export type SectionStatus = { tone: "done" | "todo" | "fix" | "optional"; text: string };

const STATUS_STYLES: Record<SectionStatus["tone"], string> = {
  done: "border-[#c6dfcb] bg-success-bg text-success",
  todo: "border-rule-strong bg-white text-ink-2",
  fix: "border-[#f1c9cd] bg-danger-bg text-danger",
  optional: "border-rule bg-paper-2 text-ink-2",
};

/** One step of the workspace: a heading that opens and closes its panel, with where the step stands. */
export function Section({
  id,
  step,
  title,
  summary,
  status,
  open,
  onToggle,
  next,
  children,
}: {
  id: SectionId;
  step: number;
  title: string;
  summary?: ReactNode;
  status: SectionStatus;
  open: boolean;
  onToggle: () => void;
  next?: { label: string; onClick: () => void };
  children: ReactNode;
}) {
  return (
    <section
      aria-labelledby={`section-${id}`}
      className={clsx("rounded-card border bg-white", open ? "border-rule-strong/70" : "border-rule")}
    >
      <h2 className="font-sans text-base">
        <button
          type="button"
          id={`section-${id}`}
          aria-expanded={open}
          aria-controls={`panel-${id}`}
          onClick={onToggle}
          className="flex min-h-15 w-full items-center gap-3 rounded-[inherit] px-4 py-2.5 text-left"
        >
          <span
            aria-hidden="true"
            className={clsx(
              "num flex size-7 shrink-0 items-center justify-center rounded-full border text-sm font-semibold",
              status.tone === "done" ? "border-teal bg-teal text-white" : "border-rule-strong text-ink-2 bg-white",
            )}
          >
            {step}
          </span>
          <span className="min-w-0 flex-1">
            <span className="text-ink block font-semibold">{title}</span>
            {summary ? <span className="text-ink-2 block truncate text-sm font-normal">{summary}</span> : null}
          </span>
          <span className={clsx("shrink-0 rounded-full border px-2 py-0.5 text-xs font-medium", STATUS_STYLES[status.tone])}>
            {status.text}
          </span>
          <svg
            viewBox="0 0 16 16"
            aria-hidden="true"
            className={clsx("text-ink-2 size-4 shrink-0 transition-transform", open && "rotate-180")}
          >
            <path d="m4 6 4 4 4-4" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
          </svg>
        </button>
      </h2>
      <div id={`panel-${id}`} hidden={!open} className="border-rule space-y-5 border-t px-4 pt-4 pb-5">
        {children}
        {next ? (
          <div className="flex justify-end">
            <Button variant="secondary" className="min-h-11" onClick={next.onClick}>
              Next: {next.label} <span aria-hidden="true">→</span>
            </Button>
          </div>
        ) : null}
      </div>
    </section>
  );
}
