"use client";

import type { ListedProblem } from "./problem-fields";

/** Problems as a list of buttons: each one opens its step and puts the cursor in the field. */
export function ProblemList({
  problems,
  onGo,
  className,
}: {
  problems: ListedProblem[];
  onGo: (path: string) => void;
  className?: string;
}) {
  return (
    <ul className={className ?? "space-y-1"}>
      {problems.map((p, i) => (
        <li key={`${p.path}-${i}`}>
          <button
            type="button"
            onClick={() => onGo(p.path)}
            className="hover:bg-paper-2 flex min-h-11 w-full items-start gap-2 rounded-md px-2 py-2 text-left text-sm"
          >
            <span aria-hidden="true" className="text-danger mt-0.5 font-semibold">
              ›
            </span>
            <span>
              <span className="text-ink decoration-rule-strong font-semibold underline underline-offset-2">{p.label}</span>
              <span className="text-ink-2">: {p.message}</span>
            </span>
          </button>
        </li>
      ))}
    </ul>
  );
}
