"use client";

import { useState } from "react";

import { Button } from "@/components/ui/button";
import { SeverityBadge } from "@/components/ui/severity-badge";

import type { ListedProblem } from "./problem-fields";
import { ProblemList } from "./problem-list";
import type { LiveCheck } from "./use-evaluation";

/** Under the diagram: the rating so far, or what keeps the engine from rating the line. */
export function LiveCheckPanel({ check, problems, onGo }: { check: LiveCheck; problems: ListedProblem[]; onGo: (path: string) => void }) {
  const [open, setOpen] = useState(false);
  const result = check.result;
  const evaluation = result?.kind === "ok" && problems.length === 0 ? result.evaluation : null;
  const hasList = problems.length > 0 || (evaluation !== null && evaluation.summary.length > 0);

  return (
    <div className="border-rule border-t pt-3">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <p role="status" className="flex min-h-11 min-w-0 flex-1 flex-wrap items-center gap-2 text-sm">
          {result === null ? (
            <span className="text-ink-2">Checking the record…</span>
          ) : result.kind === "error" ? (
            <span className="text-ink-2">{result.message}</span>
          ) : evaluation ? (
            <>
              <span className="text-ink-2">Rating so far</span>
              <SeverityBadge severity={evaluation.severity} />
              <span className="text-ink-2">
                <span className="num">{evaluation.lengths.surveyed.toFixed(1)} ft</span> surveyed
              </span>
            </>
          ) : (
            <span className="text-ink">
              <span className="num font-semibold">{problems.length}</span> {problems.length === 1 ? "thing" : "things"} to fix before the
              line can be rated
            </span>
          )}
          {check.pending && result !== null ? <span className="text-ink-2 text-xs">checking…</span> : null}
        </p>
        {hasList ? (
          <Button
            variant="ghost"
            size="sm"
            className="min-h-11"
            aria-expanded={open}
            aria-controls="live-check-list"
            onClick={() => setOpen(!open)}
          >
            {open ? "Hide" : evaluation ? "Show the summary" : "Show what to fix"}
          </Button>
        ) : null}
      </div>
      <div id="live-check-list" hidden={!open || !hasList} className="max-h-48 overflow-y-auto">
        {evaluation ? (
          <ul className="text-ink marker:text-copper list-disc space-y-1 py-1 pl-5 text-sm">
            {[...evaluation.severityReasons, ...evaluation.summary].map((s, i) => (
              <li key={i}>{s}</li>
            ))}
          </ul>
        ) : (
          <ProblemList problems={problems} onGo={onGo} />
        )}
      </div>
    </div>
  );
}
