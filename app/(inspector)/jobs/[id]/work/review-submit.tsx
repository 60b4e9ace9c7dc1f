"use client";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { SeverityBadge } from "@/components/ui/severity-badge";
import type { Evaluation } from "@/lib/engine/evaluate";

import type { ListedProblem } from "./problem-fields";
import { ProblemList } from "./problem-list";

export type ReviewCounts = { readyClips: number; segments: number; surveyedFt: number | null; locates: number; findings: number };

/** The last step: what goes to the buyer, what is still wrong, and the button that delivers it. */
export function ReviewSubmit({
  counts,
  problems,
  evaluation,
  onGo,
  onSubmit,
  submitting,
  submitError,
}: {
  counts: ReviewCounts;
  problems: ListedProblem[];
  evaluation: Evaluation | null;
  onGo: (path: string) => void;
  onSubmit: () => void;
  submitting: boolean;
  submitError: string | null;
}) {
  const plural = (n: number, one: string, many: string) => (
    <>
      <span className="num">{n}</span> {n === 1 ? one : many}
    </>
  );
  return (
    <div className="space-y-4">
      <ul className="text-ink grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
        <li>{plural(counts.readyClips, "ready clip", "ready clips")}</li>
        <li>
          {plural(counts.segments, "segment", "segments")}
          {counts.surveyedFt !== null ? (
            <>
              , <span className="num">{counts.surveyedFt.toFixed(1)} ft</span> surveyed
            </>
          ) : null}
        </li>
        <li>{plural(counts.locates, "locate mark", "locate marks")}</li>
        <li>{plural(counts.findings, "finding", "findings")}</li>
      </ul>

      <div aria-live="polite" id="review-problems" tabIndex={-1} className="outline-none">
        {problems.length > 0 ? (
          <div className="bg-warning-bg rounded-card border border-[#efdcb2] px-3 py-3">
            <h3 className="font-sans text-[0.9375rem] font-semibold">
              Before you submit: <span className="num">{problems.length}</span> {problems.length === 1 ? "thing" : "things"} to fix
            </h3>
            <ProblemList problems={problems} onGo={onGo} className="mt-2 space-y-1" />
          </div>
        ) : evaluation ? (
          <Alert tone="success" title="The record checks out" role={null}>
            <span className="inline-flex flex-wrap items-center gap-2">
              The buyer will see the line rated <SeverityBadge severity={evaluation.severity} size="sm" />
            </span>
          </Alert>
        ) : null}
      </div>

      {submitError ? <Alert tone="danger">{submitError}</Alert> : null}

      <p className="text-ink-2 text-sm">
        Submitting delivers the report: the buyer is invited to unlock the rated summary, the agent is told, and the record can no longer
        change.
      </p>
      <Button size="lg" className="w-full sm:w-auto" onClick={onSubmit} pending={submitting}>
        Submit and deliver
      </Button>
    </div>
  );
}
