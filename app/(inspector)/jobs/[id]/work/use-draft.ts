"use client";

import { useCallback, useEffect, useRef, useState } from "react";

export type DraftPayload = { record: Record<string, unknown>; narrative: string; recommendation: string };

export type SaveState =
  | { kind: "clean"; at: Date | null }
  | { kind: "saving" }
  | { kind: "saved"; at: Date }
  | { kind: "failed"; message: string }
  | { kind: "conflict"; message: string };

export const CONFLICT_MESSAGE = "This job was changed in another tab or device. Reload to see the latest.";

type Pending = { payload: DraftPayload; key: string };

/**
 * Autosave for the job's draft: one save in flight at a time, each based on the revision the last
 * one returned, so two tabs never overwrite each other silently (the server answers 409).
 */
export function useDraft({
  jobId,
  initialRevision,
  initialKey,
  delayMs = 1500,
}: {
  jobId: string;
  initialRevision: number;
  initialKey: string;
  delayMs?: number;
}) {
  const [state, setState] = useState<SaveState>({ kind: "clean", at: null });
  const revision = useRef(initialRevision);
  const savedKey = useRef(initialKey);
  const latest = useRef<Pending | null>(null);
  const inFlight = useRef<Promise<void> | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const stopped = useRef(false);
  const failed = useRef(false);

  const url = `/api/jobs/${jobId}/draft`;

  const send = useCallback(async (): Promise<void> => {
    // Loops while typing went on during a save, each time from the revision the last save returned.
    for (;;) {
      const next = latest.current;
      if (stopped.current || !next || next.key === savedKey.current) return;
      setState({ kind: "saving" });
      let res: Response;
      try {
        res = await fetch(url, {
          method: "PUT",
          headers: { "content-type": "application/json" },
          body: JSON.stringify({ ...next.payload, baseRevision: revision.current }),
        });
      } catch {
        failed.current = true;
        setState({ kind: "failed", message: "Gradeline could not be reached." });
        return;
      }
      failed.current = !res.ok;
      const body: unknown = await res.json().catch(() => null);
      if (res.ok) {
        revision.current = (body as { revision: number }).revision;
        savedKey.current = next.key;
        if (latest.current && latest.current.key !== next.key) continue;
        setState({ kind: "saved", at: new Date() });
        return;
      }
      if (res.status === 409) {
        stopped.current = true;
        setState({ kind: "conflict", message: CONFLICT_MESSAGE });
        return;
      }
      const message = (body as { error?: { message?: string } } | null)?.error?.message ?? "The draft could not be saved.";
      setState({ kind: "failed", message });
      return;
    }
  }, [url]);

  const run = useCallback(async (): Promise<void> => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    while (inFlight.current) await inFlight.current;
    const p = send().finally(() => {
      inFlight.current = null;
    });
    inFlight.current = p;
    await p;
  }, [send]);

  const schedule = useCallback(
    (payload: DraftPayload, key: string) => {
      if (stopped.current || latest.current?.key === key) return;
      latest.current = { payload, key };
      if (timer.current) clearTimeout(timer.current);
      if (key === savedKey.current) {
        timer.current = null;
        if (!inFlight.current) setState((s) => (s.kind === "saving" || s.kind === "failed" ? { kind: "saved", at: new Date() } : s));
        return;
      }
      setState((s) => (s.kind === "saving" ? s : { kind: "saving" }));
      timer.current = setTimeout(() => void run(), delayMs);
    },
    [delayMs, run],
  );

  /** Saves now whatever is waiting; true when the server has the latest values. */
  const flush = useCallback(async (): Promise<boolean> => {
    await run();
    return !stopped.current && (latest.current === null || latest.current.key === savedKey.current);
  }, [run]);

  const dirty = () => latest.current !== null && latest.current.key !== savedKey.current;

  useEffect(() => {
    const retryOnline = () => {
      if (dirty()) void run();
    };
    // A reload or a closed tab inside the debounce would lose the last keystrokes; send them on the way out.
    const onHide = () => {
      if (!dirty() || inFlight.current || stopped.current || !latest.current) return;
      void fetch(url, {
        method: "PUT",
        keepalive: true,
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ ...latest.current.payload, baseRevision: revision.current }),
      }).catch(() => undefined);
    };
    // Only a failed save warns: a pending one goes out with onHide.
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      if (dirty() && failed.current) e.preventDefault();
    };
    window.addEventListener("online", retryOnline);
    window.addEventListener("pagehide", onHide);
    window.addEventListener("beforeunload", onBeforeUnload);
    return () => {
      window.removeEventListener("online", retryOnline);
      window.removeEventListener("pagehide", onHide);
      window.removeEventListener("beforeunload", onBeforeUnload);
    };
  }, [run, url]);

  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
    },
    [],
  );

  return { state, schedule, flush, retry: run, revision: () => revision.current };
}
