"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

type ApiError = { error?: { code?: string; message?: string } };

function waitText(retryAfter: string | null): string {
  const seconds = Number(retryAfter);
  if (!Number.isFinite(seconds) || seconds <= 0) return "a few minutes";
  if (seconds < 90) return `${Math.ceil(seconds)} seconds`;
  return `${Math.ceil(seconds / 60)} minutes`;
}

/** Starts a checkout and hands the browser to the payment page. */
export function UnlockButton({ reportId }: { reportId: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function unlock() {
    setPending(true);
    setError(null);
    try {
      const res = await fetch(`/api/reports/${reportId}/checkout`, { method: "POST", headers: { accept: "application/json" } });
      const data = (await res.json().catch(() => null)) as ({ url?: string } & ApiError) | null;
      if (res.ok && data?.url) {
        window.location.assign(data.url);
        return;
      }
      if (res.status === 409) {
        router.refresh();
        return;
      }
      if (res.status === 429) {
        setError(
          `Too many payment attempts in a short time. Wait ${waitText(res.headers.get("retry-after"))} and try again; nothing was charged.`,
        );
      } else if (res.status === 401) {
        setError("Your session has ended. Sign in again to unlock the report.");
      } else {
        setError(data?.error?.message ?? "The payment page could not be opened. Nothing was charged; please try again.");
      }
    } catch {
      setError("Gradeline could not be reached. Check your connection and try again; nothing was charged.");
    }
    setPending(false);
  }

  return (
    <div className="space-y-3">
      <Button size="lg" className="w-full" pending={pending} onClick={unlock}>
        Unlock the rated summary
      </Button>
      <div aria-live="polite">
        {error ? (
          <Alert tone="danger" role={null}>
            {error}
          </Alert>
        ) : null}
      </div>
    </div>
  );
}
