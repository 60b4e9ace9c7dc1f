"use client";

import { useId, useRef, useState, type FormEvent } from "react";
import useSWR from "swr";

import { Countdown, useNow } from "@/components/countdown";
import { OrderTimeline } from "@/components/order-timeline";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button, ButtonLink } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Input } from "@/components/ui/input";
import { Money } from "@/components/ui/money";
import { StatusBadge } from "@/components/ui/status-badge";
import { Textarea } from "@/components/ui/textarea";
import { formatDateTime } from "@/lib/format";
import type { JobDto, OrderEventDto, ProposalDto } from "@/lib/orders/dto";
import { formatTimeRange, isoToZonedLocal, zonedLocalToIso } from "@/lib/time-zones";
import { getJson, postJson } from "@/lib/api/client";
import { DetailRow } from "@/components/ui/detail-row";

export type JobDetailData = { job: JobDto; proposals: ProposalDto[]; events: OrderEventDto[] };
type Slot = { key: number; date: string; from: string; to: string };

const PROPOSAL_LABELS: Record<ProposalDto["status"], { label: string; tone: "neutral" | "teal" | "success" | "outline" }> = {
  proposed: { label: "Waiting for the agent", tone: "teal" },
  confirmed: { label: "Confirmed", tone: "success" },
  declined: { label: "Not chosen", tone: "outline" },
  withdrawn: { label: "Withdrawn", tone: "outline" },
};

/** A first suggestion: the start of the first window still ahead, one hour long. */
function suggestSlot(job: JobDto, key: number): Slot {
  const now = Date.now();
  const w = job.visitWindows.find((v) => Date.parse(v.start) > now);
  if (!w) return { key, date: "", from: "", to: "" };
  const start = isoToZonedLocal(w.start, job.timeZone);
  const end = isoToZonedLocal(new Date(Math.min(Date.parse(w.start) + 3_600_000, Date.parse(w.end))).toISOString(), job.timeZone);
  return { key, date: start?.date ?? "", from: start?.time ?? "", to: end?.time ?? "" };
}

function checkSlot(slot: Slot, job: JobDto): { start?: string; end?: string; iso?: { start: string; end: string } } {
  const start = zonedLocalToIso(slot.date, slot.from, job.timeZone);
  const end = zonedLocalToIso(slot.date, slot.to, job.timeZone);
  if (!start || !end) return { start: "Enter the day and both times." };
  const s = Date.parse(start);
  const e = Date.parse(end);
  if (e <= s) return { end: "The visit must end after it starts." };
  if (s <= Date.now()) return { start: "This time has passed." };
  if (e > Date.parse(job.deadline)) return { end: "This visit would end after the contingency deadline." };
  if (!job.visitWindows.some((w) => s >= Date.parse(w.start) && e <= Date.parse(w.end))) return { start: "Keep the visit inside one of the agent's windows." };
  return { iso: { start, end } };
}

/** Wording for the job's fixed answers, looked up on the server (keeps zod out of this bundle). */
export type JobLabels = { propertyType: string; occupancy: string };

export function JobDetail({ initial, inspectorId, labels }: { initial: JobDetailData; inspectorId: string; labels: JobLabels }) {
  const { data, mutate } = useSWR(`/api/jobs/${initial.job.id}`, (url: string) => getJson<JobDetailData>(url, "This job is no longer available to you."), { fallbackData: initial, refreshInterval: 15_000 });
  const { job, proposals, events } = data ?? initial;
  const now = useNow();
  const [notice, setNotice] = useState<{ tone: "success" | "warning" | "danger"; text: string } | null>(null);
  const [accepting, setAccepting] = useState(false);
  const mine = job.inspector?.id === inspectorId;
  const tz = job.timeZone;
  const live = job.status === "open" || job.status === "accepted" || job.status === "scheduled";
  const visitStarted = !!job.appointment && now !== null && Date.parse(job.appointment.start) <= now;

  async function accept() {
    setAccepting(true);
    setNotice(null);
    const res = await postJson<{ job: JobDto }>(`/api/jobs/${job.id}/accept`);
    setAccepting(false);
    if (res.ok) setNotice({ tone: "success", text: "The job is yours. Propose one or more visit times below." });
    else setNotice({ tone: res.status === 409 ? "warning" : "danger", text: res.error.message });
    await mutate();
  }

  return (
    <div className="space-y-6">
      <p className="flex flex-wrap items-center gap-2 text-sm text-ink-2">
        State <StatusBadge status={job.status} className="text-sm" />
        {mine ? <Badge tone="teal">Your job</Badge> : null}
        <span className="lg:hidden">
          · Payout <Money cents={job.inspectorPayoutCents} className="text-ink" />
          {live ? (
            <>
              {" "}
              · Deadline <Countdown to={job.deadline} timeZone={tz} />
            </>
          ) : null}
        </span>
      </p>
      <div aria-live="polite">{notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}</div>

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem] lg:items-start">
        <div className="space-y-6">
          {!mine && job.status === "open" ? (
            <Card>
              <CardHeader title="This job is open" description="The first inspector to accept gets it." />
              <CardBody>
                <Button onClick={accept} pending={accepting}>
                  Accept job
                </Button>
              </CardBody>
            </Card>
          ) : null}

          {mine && (job.status === "accepted" || job.status === "scheduled") ? (
            <Card>
              <CardHeader title="Record the line" description="Upload clips, record the line profile and findings, and deliver the report." />
              <CardBody>
                <ButtonLink href={`/jobs/${job.id}/work`}>Open the job workspace</ButtonLink>
              </CardBody>
            </Card>
          ) : null}

          {mine && job.appointment ? (
            <Card>
              <CardHeader title="Confirmed visit" />
              <CardBody>
                <p className="num text-lg font-medium">{formatTimeRange(job.appointment.start, job.appointment.end, tz)}</p>
              </CardBody>
            </Card>
          ) : null}

          {mine && job.status === "accepted" ? (
            <ProposeTimes job={job} proposals={proposals} onProposed={() => mutate()} />
          ) : mine && proposals.length ? (
            <Card>
              <CardHeader title="Times you proposed" />
              <CardBody>
                <ProposalList proposals={proposals} timeZone={tz} />
              </CardBody>
            </Card>
          ) : null}

          <Card>
            <CardHeader title="The job" />
            <CardBody>
              <dl className="divide-y divide-rule">
                <DetailRow label="Access">{job.accessNotes}</DetailRow>
                <DetailRow label="Cleanout">{job.cleanoutKnown ? (job.cleanoutNote ?? "Known") : "None known: pull a toilet or use a roof vent"}</DetailRow>
                <DetailRow label="Property">
                  {labels.propertyType}
                  {job.yearBuilt ? <>, built <span className="num">{job.yearBuilt}</span></> : null}
                </DetailRow>
                <DetailRow label="Occupancy">{labels.occupancy}</DetailRow>
                <DetailRow label="Building sewers">
                  <span className="num">{job.buildingSewers}</span>
                </DetailRow>
                <DetailRow label="Buyer">{job.buyerName}</DetailRow>
                {job.notes ? <DetailRow label="Notes">{job.notes}</DetailRow> : null}
              </dl>
            </CardBody>
          </Card>

          <Card>
            <CardHeader title="Timeline" />
            <CardBody>
              <OrderTimeline events={events} timeZone={tz} />
            </CardBody>
          </Card>
        </div>

        <div className="space-y-6">
          <Card>
            <CardHeader title="Deadline" />
            <CardBody className="space-y-1">
              <p className="num">{formatDateTime(job.deadline, tz)}</p>
              {live ? <Countdown to={job.deadline} timeZone={tz} className="text-lg" /> : null}
            </CardBody>
          </Card>
          <Card>
            <CardHeader title="Your payout" />
            <CardBody className="space-y-2">
              <Money cents={job.inspectorPayoutCents} className="text-2xl font-semibold text-teal" />
              <div className="flex flex-wrap gap-1.5">
                {job.addOns.length ? job.addOns.map((a) => <Badge key={a} tone="copper">{a}</Badge>) : <span className="text-sm text-ink-2">No add-ons</span>}
              </div>
            </CardBody>
          </Card>
          {mine && (job.status === "accepted" || job.status === "scheduled") && !visitStarted ? (
            <ReleaseJob
              jobId={job.id}
              onReleased={() => {
                setNotice({ tone: "success", text: "You released the job. It is back on the board and the agent has been told." });
                void mutate();
              }}
            />
          ) : null}
        </div>
      </div>
    </div>
  );
}

function ProposalList({ proposals, timeZone }: { proposals: ProposalDto[]; timeZone: string }) {
  return (
    <ul className="divide-y divide-rule rounded-md border border-rule">
      {proposals.map((p) => (
        <li key={p.id} className="flex flex-wrap items-center justify-between gap-2 px-4 py-2.5">
          <span className="num text-[0.9375rem]">{formatTimeRange(p.start, p.end, timeZone)}</span>
          <Badge tone={PROPOSAL_LABELS[p.status].tone}>{PROPOSAL_LABELS[p.status].label}</Badge>
        </li>
      ))}
    </ul>
  );
}

function ProposeTimes({ job, proposals, onProposed }: { job: JobDto; proposals: ProposalDto[]; onProposed: () => void }) {
  const id = useId();
  const nextKey = useRef(1);
  const [slots, setSlots] = useState<Slot[]>(() => [suggestSlot(job, 0)]);
  const [errors, setErrors] = useState<Record<number, { start?: string; end?: string }>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const [sent, setSent] = useState(false);
  const tz = job.timeZone;

  const change = (key: number, patch: Partial<Slot>) => setSlots((all) => all.map((s) => (s.key === key ? { ...s, ...patch } : s)));

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setFormError(null);
    setSent(false);
    const checked = slots.map((s) => checkSlot(s, job));
    const found: Record<number, { start?: string; end?: string }> = {};
    checked.forEach((c, i) => {
      if (!c.iso) found[slots[i].key] = { start: c.start, end: c.end };
    });
    setErrors(found);
    if (Object.keys(found).length) {
      const firstBad = slots.find((s) => found[s.key]);
      if (firstBad) document.getElementById(`${id}-${firstBad.key}-d`)?.focus();
      return;
    }
    setPending(true);
    const res = await postJson<{ proposals: ProposalDto[] }>(`/api/jobs/${job.id}/appointments`, { slots: checked.map((c) => c.iso) });
    setPending(false);
    if (!res.ok) {
      const mapped: Record<number, { start?: string; end?: string }> = {};
      for (const [path, messages] of Object.entries(res.error.fieldErrors ?? {})) {
        const m = /^slots\[(\d+)\]\.(start|end)$/.exec(path);
        if (m && slots[Number(m[1])]) mapped[slots[Number(m[1])].key] = { ...mapped[slots[Number(m[1])].key], [m[2]]: messages[0] };
      }
      setErrors(mapped);
      setFormError(res.error.fieldErrors?.slots?.[0] ?? res.error.message);
      return;
    }
    setSent(true);
    setSlots([{ key: nextKey.current++, date: "", from: "", to: "" }]);
    onProposed();
  }

  return (
    <Card>
      <CardHeader
        title="Propose visit times"
        description={job.anyTimeInWindows ? "The agent accepts any time in their windows: your first proposal inside them is confirmed at once." : "The agent confirms one of the times you propose."}
      />
      <CardBody className="space-y-5">
        <div>
          <h3 className="text-sm font-semibold text-ink">The agent&apos;s windows</h3>
          <ul className="mt-1 space-y-0.5">
            {job.visitWindows.map((w) => (
              <li key={w.start} className="num text-[0.9375rem]">
                {formatTimeRange(w.start, w.end, tz)}
              </li>
            ))}
          </ul>
          <p className="mt-1 text-sm text-ink-2">Every visit must fit inside one window and end before the deadline, {formatDateTime(job.deadline, tz)}.</p>
        </div>

        {proposals.length ? (
          <div>
            <h3 className="mb-1 text-sm font-semibold text-ink">Already proposed</h3>
            <ProposalList proposals={proposals} timeZone={tz} />
          </div>
        ) : null}

        <form onSubmit={submit} noValidate className="space-y-3">
          <div aria-live="polite">
            {formError ? <Alert tone="danger">{formError}</Alert> : sent ? <Alert tone="success">Sent. The agent has an e-mail with your times.</Alert> : null}
          </div>
          <ul className="space-y-3">
            {slots.map((slot, i) => {
              const err = errors[slot.key];
              const message = err?.start ?? err?.end;
              const a11y = { "aria-invalid": message ? true : undefined, "aria-describedby": message ? `${id}-${slot.key}-err` : undefined } as const;
              return (
                <li key={slot.key} className="rounded-md border border-rule bg-paper/60 p-3">
                  <fieldset>
                    <legend className="text-sm font-medium">Visit time {i + 1}</legend>
                    <div className="mt-2 grid grid-cols-2 gap-3 sm:grid-cols-[1.4fr_1fr_1fr_auto] sm:items-end">
                      <div className="col-span-2 space-y-1.5 sm:col-span-1">
                        <label htmlFor={`${id}-${slot.key}-d`} className="text-sm text-ink-2">
                          Day
                        </label>
                        <Input id={`${id}-${slot.key}-d`} type="date" value={slot.date} onChange={(e) => change(slot.key, { date: e.target.value })} {...a11y} />
                      </div>
                      <div className="space-y-1.5">
                        <label htmlFor={`${id}-${slot.key}-f`} className="text-sm text-ink-2">
                          From
                        </label>
                        <Input id={`${id}-${slot.key}-f`} type="time" value={slot.from} onChange={(e) => change(slot.key, { from: e.target.value })} {...a11y} />
                      </div>
                      <div className="space-y-1.5">
                        <label htmlFor={`${id}-${slot.key}-t`} className="text-sm text-ink-2">
                          Until
                        </label>
                        <Input id={`${id}-${slot.key}-t`} type="time" value={slot.to} onChange={(e) => change(slot.key, { to: e.target.value })} {...a11y} />
                      </div>
                      {slots.length > 1 ? (
                        <Button variant="ghost" className="col-span-2 justify-self-start sm:col-span-1" onClick={() => setSlots((all) => all.filter((s) => s.key !== slot.key))}>
                          Remove<span className="sr-only"> visit time {i + 1}</span>
                        </Button>
                      ) : null}
                    </div>
                    <p id={`${id}-${slot.key}-err`} aria-live="polite" className="mt-2 text-sm font-medium text-danger empty:hidden">
                      {message}
                    </p>
                  </fieldset>
                </li>
              );
            })}
          </ul>
          <div className="flex flex-wrap gap-2">
            {slots.length < 5 ? (
              <Button variant="secondary" onClick={() => setSlots((all) => [...all, { key: nextKey.current++, date: "", from: "", to: "" }])}>
                Add another time
              </Button>
            ) : null}
            <Button type="submit" pending={pending}>
              {slots.length > 1 ? "Propose these times" : "Propose this time"}
            </Button>
          </div>
        </form>
      </CardBody>
    </Card>
  );
}

function ReleaseJob({ jobId, onReleased }: { jobId: string; onReleased: () => void }) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const textRef = useRef<HTMLTextAreaElement>(null);

  async function submit(e: FormEvent) {
    e.preventDefault();
    if (reason.trim().length < 3) {
      setError("Give a short reason; the agent sees it.");
      textRef.current?.focus();
      return;
    }
    setPending(true);
    const res = await postJson<{ ok: true }>(`/api/jobs/${jobId}/release`, { reason: reason.trim() });
    setPending(false);
    if (!res.ok) return setError(res.error.fieldErrors?.reason?.[0] ?? res.error.message);
    onReleased();
  }

  return (
    <Card>
      <CardHeader title="Release the job" description="Possible until the visit starts. It goes back on the board." />
      <CardBody>
        {!open ? (
          <Button
            variant="secondary"
            onClick={() => {
              setOpen(true);
              requestAnimationFrame(() => textRef.current?.focus());
            }}
          >
            Release job…
          </Button>
        ) : (
          <form onSubmit={submit} noValidate className="space-y-3">
            <div className="space-y-1.5">
              <label htmlFor={`${id}-reason`} className="text-sm font-medium">
                Why are you releasing it?
              </label>
              <Textarea
                id={`${id}-reason`}
                ref={textRef}
                rows={3}
                maxLength={500}
                value={reason}
                onChange={(e) => setReason(e.target.value)}
                aria-invalid={error ? true : undefined}
                aria-describedby={error ? `${id}-err` : undefined}
              />
              <p id={`${id}-err`} aria-live="polite" className="text-sm font-medium text-danger empty:hidden">
                {error}
              </p>
            </div>
            <div className="flex flex-wrap gap-2">
              <Button type="submit" variant="danger" pending={pending}>
                Release the job
              </Button>
              <Button variant="ghost" onClick={() => setOpen(false)}>
                Keep it
              </Button>
            </div>
          </form>
        )}
      </CardBody>
    </Card>
  );
}
