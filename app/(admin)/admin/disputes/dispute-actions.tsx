"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import { postJson } from "@/lib/api/client";

export function DisputeActions({ disputeId }: { disputeId: string }) {
  const router = useRouter();
  const [to, setTo] = useState<"inspector" | "opener">("inspector");
  const [body, setBody] = useState("");
  const [outcome, setOutcome] = useState<"no_action" | "redeliver" | "refund">("no_action");
  const [note, setNote] = useState("");
  const [status, setStatus] = useState<string | null>(null);

  async function post(path: string, payload: unknown, done: string) {
    setStatus("Working…");
    const res = await postJson(`/api/admin/disputes/${disputeId}/${path}`, payload);
    setStatus(res.ok ? done : res.error.message);
    if (res.ok) router.refresh();
  }

  return (
    <div className="grid gap-6 md:grid-cols-2">
      <form
        className="space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          void post("messages", { to, body }, "Message sent.").then(() => setBody(""));
        }}
      >
        <Field label="Write to">
          {(c) => (
            <Select {...c} value={to} onChange={(e) => setTo(e.target.value as "inspector" | "opener")}>
              <option value="inspector">The inspector</option>
              <option value="opener">The person who disputed</option>
            </Select>
          )}
        </Field>
        <Field label="Message (sent by e-mail)">{(c) => <Textarea {...c} value={body} onChange={(e) => setBody(e.target.value)} rows={3} />}</Field>
        <Button type="submit" variant="secondary">
          Send
        </Button>
      </form>
      <form
        className="space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          void post("close", { outcome, note }, "Dispute closed.");
        }}
      >
        <Field label="Outcome">
          {(c) => (
            <Select {...c} value={outcome} onChange={(e) => setOutcome(e.target.value as typeof outcome)}>
              <option value="no_action">No action</option>
              <option value="redeliver">Inspector re-delivers</option>
              <option value="refund">Refund the buyer in full</option>
            </Select>
          )}
        </Field>
        <Field label="Decision and reason">{(c) => <Textarea {...c} value={note} onChange={(e) => setNote(e.target.value)} rows={3} />}</Field>
        <Button type="submit">Close dispute</Button>
      </form>
      <p aria-live="polite" className="text-sm md:col-span-2">
        {status}
      </p>
    </div>
  );
}
