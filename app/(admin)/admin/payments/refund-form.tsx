"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { postJson } from "@/lib/api/client";


export function RefundForm({ paymentId, remainingCents }: { paymentId: string; remainingCents: number }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [requestId, setRequestId] = useState(() => crypto.randomUUID());
  const [amount, setAmount] = useState((remainingCents / 100).toFixed(2));
  const [reason, setReason] = useState("");
  const [reverse, setReverse] = useState(true);
  const [why, setWhy] = useState("");
  const [busy, setBusy] = useState(false);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ tone: "danger" | "success"; text: string } | null>(null);

  if (!open) {
    return (
      <Button variant="secondary" size="sm" onClick={() => setOpen(true)}>
        Refund…
      </Button>
    );
  }

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const cents = Math.round(Number(amount) * 100);
    if (!Number.isFinite(cents) || cents < 1) return setErrors({ amountCents: ["Enter an amount like 100.00."] });
    setBusy(true);
    setErrors({});
    const res = await postJson(`/api/admin/payments/${paymentId}/refund`, {
      amountCents: cents,
      reason,
      reverseTransfer: reverse,
      noReversalReason: reverse ? undefined : why,
      requestId,
    });
    setBusy(false);
    if (!res.ok) {
      setErrors(res.error.fieldErrors ?? {});
      // The request id is kept: sending the same refund again cannot refund twice.
      return setMessage({ tone: "danger", text: res.error.message });
    }
    setMessage({ tone: "success", text: "Refund sent." });
    setRequestId(crypto.randomUUID());
    router.refresh();
  }

  return (
    <form onSubmit={submit} className="space-y-4 rounded-md border border-rule bg-paper p-4" noValidate>
      <div aria-live="polite">{message ? <Alert tone={message.tone}>{message.text}</Alert> : null}</div>
      <Field label="Amount to refund (USD)" hint={`Up to ${(remainingCents / 100).toFixed(2)}.`} error={errors.amountCents?.[0]} required>
        {(c) => <Input {...c} inputMode="decimal" value={amount} onChange={(e) => setAmount(e.target.value)} className="num max-w-40" />}
      </Field>
      <Field label="Reason (recorded in the audit log)" error={errors.reason?.[0]} required>
        {(c) => <Input {...c} value={reason} onChange={(e) => setReason(e.target.value)} />}
      </Field>
      <Checkbox label="Take the inspector's share back in proportion" checked={reverse} onChange={(e) => setReverse(e.target.checked)} />
      {!reverse ? (
        <Field label="Why the inspector keeps their share" error={errors.noReversalReason?.[0]} required>
          {(c) => <Input {...c} value={why} onChange={(e) => setWhy(e.target.value)} />}
        </Field>
      ) : null}
      <div className="flex gap-2">
        <Button type="submit" variant="danger" disabled={busy}>
          {busy ? "Refunding…" : "Refund"}
        </Button>
        <Button type="button" variant="ghost" onClick={() => setOpen(false)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
