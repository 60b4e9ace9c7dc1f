"use client";

import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

const EVERY_MS = 1500;
const GIVE_UP_MS = 60_000;

/** After the return from the payment page: waits for the provider's confirmation to unlock the report. */
export function ConfirmingPayment({ reportId }: { reportId: string }) {
  const router = useRouter();
  const [round, setRound] = useState(0);
  const [timedOut, setTimedOut] = useState(false);

  useEffect(() => {
    let stopped = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const startedAt = Date.now();

    async function check() {
      try {
        const res = await fetch(`/api/reports/${reportId}`, { headers: { accept: "application/json" }, cache: "no-store" });
        if (res.ok) {
          const view = (await res.json()) as { locked?: boolean };
          if (view.locked === false) {
            if (!stopped) router.refresh();
            return;
          }
        }
      } catch {
        // A dropped request is retried on the next tick.
      }
      if (stopped) return;
      if (Date.now() - startedAt >= GIVE_UP_MS) setTimedOut(true);
      else timer = setTimeout(check, EVERY_MS);
    }

    timer = setTimeout(check, EVERY_MS);
    return () => {
      stopped = true;
      clearTimeout(timer);
    };
  }, [reportId, round, router]);

  if (timedOut) {
    return (
      <Alert tone="info" title="Still waiting for the payment to be confirmed" role="status">
        <p>
          This is taking longer than usual. If your card was charged, the report unlocks as soon as the confirmation arrives, and you will
          not be charged twice. If you left the payment page without paying, <a href={`/reports/${reportId}`}>go back to the report</a> to
          start again.
        </p>
        <Button
          variant="secondary"
          size="sm"
          className="mt-3"
          onClick={() => {
            setTimedOut(false);
            setRound((n) => n + 1);
          }}
        >
          Check again
        </Button>
      </Alert>
    );
  }

  return (
    <div role="status" className="rounded-card bg-info-bg flex items-center gap-3 border border-teal-200 px-4 py-3">
      <svg viewBox="0 0 16 16" className="text-teal size-5 shrink-0 motion-safe:animate-spin" aria-hidden="true">
        <circle cx="8" cy="8" r="6" fill="none" stroke="currentColor" strokeOpacity="0.3" strokeWidth="2" />
        <path d="M14 8a6 6 0 0 0-6-6" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      </svg>
      <div>
        <p className="text-ink font-semibold">Confirming your payment…</p>
        <p className="text-ink-2 text-sm">The rated summary opens here by itself in a moment. You can keep this page open.</p>
      </div>
    </div>
  );
}
