"use client";

import { useEffect, useId, useRef, useState, type FormEvent } from "react";

import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import { DISPUTE_MESSAGE, DISPUTE_REASONS, outcomeLabel, reasonLabel, type DisputeDto } from "@/lib/disputes";
import { formatDate } from "@/lib/format";
import { postJson } from "@/lib/api/client";

type Errors = { reason?: string; message?: string; form?: string };

/** Dispute a delivered report (to the admin, by e-mail), or see how the last dispute stands. */
export function DisputePanel({ reportId, initial }: { reportId: string; initial: DisputeDto | null }) {
  const [dispute, setDispute] = useState(initial);
  const [open, setOpen] = useState(false);
  const [justSent, setJustSent] = useState(false);
  const toggleRef = useRef<HTMLButtonElement>(null);
  const statusRef = useRef<HTMLDivElement>(null);
  const headingId = useId();

  const canOpen = dispute?.status !== "open";
  return (
    <Card aria-labelledby={headingId} data-print="hide">
      <CardHeader
        title={<span id={headingId}>Something wrong with this report?</span>}
        description="If part of the line was not filmed, the address is wrong or the clips cannot be played, tell us. An admin reads every dispute, talks to the inspector and replies by e-mail."
      />
      <CardBody className="space-y-4">
        <div aria-live="polite" ref={statusRef} tabIndex={-1} className="outline-none">
          {dispute ? <DisputeStatus dispute={dispute} justSent={justSent} /> : null}
        </div>
        {canOpen && !open ? (
          <Button
            ref={toggleRef}
            variant="secondary"
            onClick={() => {
              setOpen(true);
              setJustSent(false);
            }}
          >
            {dispute ? "Dispute this report again…" : "Dispute this report…"}
          </Button>
        ) : null}
        {canOpen && open ? (
          <DisputeForm
            reportId={reportId}
            onSent={(d) => {
              setDispute(d);
              setJustSent(true);
              setOpen(false);
              requestAnimationFrame(() => statusRef.current?.focus());
            }}
            onCancel={() => {
              setOpen(false);
              requestAnimationFrame(() => toggleRef.current?.focus());
            }}
          />
        ) : null}
      </CardBody>
    </Card>
  );
}

function DisputeStatus({ dispute, justSent }: { dispute: DisputeDto; justSent: boolean }) {
  if (dispute.status === "open") {
    return (
      <Alert tone={justSent ? "success" : "info"} title={justSent ? "Dispute sent" : "Your dispute is open"} role={null}>
        <p className="flex flex-wrap items-center gap-2">
          <Badge tone="warning">Open</Badge>
          <span>
            {reasonLabel(dispute.reason)}, sent on <span className="num">{formatDate(dispute.createdAt)}</span>.
          </span>
        </p>
        <p>An admin is looking into it and will reply by e-mail, usually within one working day.</p>
      </Alert>
    );
  }
  return (
    <Alert tone="info" title="Your last dispute is closed" role={null}>
      <p className="flex flex-wrap items-center gap-2">
        <Badge tone="neutral">Closed: {outcomeLabel(dispute.outcome)}</Badge>
        <span>
          {reasonLabel(dispute.reason)}, closed on <span className="num">{formatDate(dispute.closedAt ?? dispute.createdAt)}</span>.
        </span>
      </p>
      {dispute.outcomeNote ? <p>{dispute.outcomeNote}</p> : null}
    </Alert>
  );
}

function DisputeForm({ reportId, onSent, onCancel }: { reportId: string; onSent: (d: DisputeDto) => void; onCancel: () => void }) {
  const [reason, setReason] = useState("");
  const [message, setMessage] = useState("");
  const [errors, setErrors] = useState<Errors>({});
  const [pending, setPending] = useState(false);
  const reasonRef = useRef<HTMLSelectElement>(null);
  const messageRef = useRef<HTMLTextAreaElement>(null);
  useEffect(() => reasonRef.current?.focus(), []);

  async function submit(e: FormEvent) {
    e.preventDefault();
    const found: Errors = {};
    if (!reason) found.reason = "Choose what is wrong.";
    if (message.trim().length < DISPUTE_MESSAGE.min) found.message = "Say in a sentence or two what is wrong.";
    if (found.reason || found.message) {
      setErrors(found);
      (found.reason ? reasonRef : messageRef).current?.focus();
      return;
    }
    setPending(true);
    setErrors({});
    const res = await postJson<DisputeDto>(`/api/reports/${reportId}/disputes`, { reason, message: message.trim() });
    if (res.ok) return onSent(res.data);
    const fe = res.error.fieldErrors ?? {};
    setErrors({ reason: fe.reason?.[0], message: fe.message?.[0], form: res.error.message });
    setPending(false);
  }

  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <div aria-live="polite">{errors.form ? <Alert tone="danger">{errors.form}</Alert> : null}</div>
      <Field label="What is wrong?" error={errors.reason} required>
        {(c) => (
          <div className="sm:max-w-sm">
            <Select {...c} ref={reasonRef} value={reason} onChange={(e) => setReason(e.target.value)}>
              <option value="">Choose…</option>
              {Object.entries(DISPUTE_REASONS).map(([value, label]) => (
                <option key={value} value={value}>
                  {label}
                </option>
              ))}
            </Select>
          </div>
        )}
      </Field>
      <Field
        label="What happened"
        hint="Where on the line, which clip, what you expected. The admin may pass it on to the inspector."
        error={errors.message}
        required
      >
        {(c) => (
          <Textarea
            {...c}
            ref={messageRef}
            rows={4}
            maxLength={DISPUTE_MESSAGE.max}
            value={message}
            onChange={(e) => setMessage(e.target.value)}
          />
        )}
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={pending}>
          Send the dispute
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
