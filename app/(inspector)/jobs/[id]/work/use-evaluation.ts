"use client";

import { useEffect, useRef, useState } from "react";

import type { Evaluation } from "@/lib/engine/evaluate";

export type CheckResult =
  { kind: "ok"; evaluation: Evaluation } | { kind: "problems"; fieldErrors: Record<string, string[]> } | { kind: "error"; message: string };

/** The latest answer of the engine, kept on screen while the next one is on its way. */
export type LiveCheck = { pending: boolean; result: CheckResult | null };

/**
 * Runs the engine on the server a moment after the record stops changing; only the latest answer
 * counts. recordJson is the record as JSON (it doubles as the key that says it changed).
 */
export function useEvaluation(recordJson: string, delayMs = 700): LiveCheck {
  const [check, setCheck] = useState<LiveCheck>({ pending: true, result: null });
  const first = useRef(true);

  useEffect(() => {
    // The record as loaded is checked at once; edits wait until typing pauses.
    const wait = first.current ? 0 : delayMs;
    first.current = false;
    const controller = new AbortController();
    const timer = setTimeout(async () => {
      setCheck((c) => ({ ...c, pending: true }));
      let result: CheckResult;
      try {
        const res = await fetch("/api/evaluate", {
          method: "POST",
          headers: { "content-type": "application/json" },
          body: `{"record":${recordJson}}`,
          signal: controller.signal,
        });
        const body: unknown = await res.json().catch(() => null);
        const error = (body as { error?: { message?: string; fieldErrors?: Record<string, string[]> } } | null)?.error;
        if (res.ok) result = { kind: "ok", evaluation: (body as { evaluation: Evaluation }).evaluation };
        else if (res.status === 400 && error?.fieldErrors) result = { kind: "problems", fieldErrors: error.fieldErrors };
        else result = { kind: "error", message: error?.message ?? "The record could not be checked just now." };
      } catch {
        if (controller.signal.aborted) return;
        result = { kind: "error", message: "Gradeline could not be reached to check the record." };
      }
      if (!controller.signal.aborted) setCheck({ pending: false, result });
    }, wait);
    return () => {
      clearTimeout(timer);
      controller.abort();
    };
  }, [recordJson, delayMs]);

  return check;
}
