"use client";

import { useState } from "react";

import { Button } from "@/components/ui/button";

export function ConnectPayoutsButton({ label }: { label: string }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function go() {
    setBusy(true);
    setError(null);
    const res = await fetch("/api/payouts/connect", { method: "POST" });
    const body = (await res.json().catch(() => ({}))) as { url?: string; error?: { message?: string } };
    if (res.ok && body.url) return window.location.assign(body.url);
    setBusy(false);
    setError(body.error?.message ?? "We could not reach the payment provider. Try again in a minute.");
  }
  return (
    <div className="space-y-2">
      <Button onClick={go} disabled={busy}>
        {busy ? "Opening…" : label}
      </Button>
      <p aria-live="polite" className="text-sm text-danger">
        {error}
      </p>
    </div>
  );
}
