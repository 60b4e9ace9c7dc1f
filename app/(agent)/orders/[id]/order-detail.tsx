"use client";

import { useId, useRef, useState, type FormEvent } from "react";
import useSWR from "swr";

import { Countdown, useNow } from "@/components/countdown";
import { OrderTimeline } from "@/components/order-timeline";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Money } from "@/components/ui/money";
import { StatusBadge } from "@/components/ui/status-badge";
import { Textarea } from "@/components/ui/textarea";
import { formatDateTime } from "@/lib/format";
import type { OrderDetailDto, OrderDto } from "@/lib/orders/dto";
import { formatTimeRange } from "@/lib/time-zones";
import { getJson, postJson } from "@/lib/api/client";
import { DetailRow } from "@/components/ui/detail-row";


const INVITATION_TEXT: Record<OrderDto["buyer"]["invitation"], { label: string; tone: "neutral" | "teal" | "success"; note: string }> = {
  waiting_for_report: { label: "Not invited yet", tone: "neutral", note: "The invitation goes out as soon as the findings are delivered." },
  invited: { label: "Invited", tone: "teal", note: "The buyer has the invitation e-mail and can unlock the report." },
  joined: { label: "Joined", tone: "success", note: "The buyer has an account and can see the report." },
};

/** Wording for the order's fixed answers, looked up on the server (keeps zod out of this bundle). */
export type OrderLabels = { propertyType: string; occupancy: string };

export function OrderDetail({ initial, labels }: { initial: OrderDetailDto; labels: OrderLabels }) {
  const { data, mutate } = useSWR(`/api/orders/${initial.order.id}`, (url: string) => getJson<OrderDetailDto>(url), { fallbackData: initial, refreshInterval: 15_000 });
  const { order, events, proposals } = data ?? initial;
  const now = useNow();
  const [message, setMessage] = useState<{ tone: "success" | "danger"; text: string } | null>(null);
  const [busy, setBusy] = useState<string | null>(null);

  const tz = order.timeZone;
  const live = order.status === "open" || order.status === "accepted" || order.status === "scheduled";
  const visitStarted = !!order.appointment && now !== null && Date.parse(order.appointment.start) <= now;
  const canCancel = live && !visitStarted;
  const open = proposals.filter((p) => p.status === "proposed");

  async function confirm(proposalId: string) {
    setBusy(proposalId);
    setMessage(null);
    const res = await postJson<OrderDetailDto>(`/api/orders/${order.id}/appointment`, { proposalId });
    setBusy(null);
    if (!res.ok) return setMessage({ tone: "danger", text: res.error.message });
    await mutate(res.data, { revalidate: false });
    setMessage({ tone: "success", text: "Appointment confirmed. The inspector and the buyer get an e-mail with a calendar file." });
  }

  return (
    <div className="space-y-6">
      <p className="flex flex-wrap items-center gap-2 text-sm text-ink-2">
        State <StatusBadge status={order.status} className="text-sm" />
        {live ? (
          <span className="lg:hidden">
            · Deadline <Countdown to={order.deadline} timeZone={tz} />
          </span>
        ) : null}
      </p>
      <div aria-live="polite">{message ? <Alert tone={message.tone}>{message.text}</Alert> : null}</div>

      {order.atRisk.flagged ? (
        <Alert tone="warning" title="This order is at risk of missing its deadline" role="note">
          <ul className="list-disc pl-5">
            {order.atRisk.text.map((t) => (
              <li key={t}>{t}</li>
            ))}
          </ul>
          <p className="mt-1">Consider asking the seller&apos;s side for an extension, or widen your visit windows.</p>
        </Alert>
      ) : null}

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem] lg:items-start">
        <div className="space-y-6">
          <Card>
            <CardHeader title="Appointment" description={order.anyTimeInWindows ? "You chose any time in your windows: the inspector's first proposal inside them is confirmed for you." : undefined} />
            <CardBody className="space-y-4">
              {order.appointment ? (
                <div>
                  <p className="text-sm text-ink-2">Confirmed visit</p>
                  <p className="num text-lg font-medium text-ink">{formatTimeRange(order.appointment.start, order.appointment.end, tz)}</p>
                </div>
              ) : !order.inspector ? (
                <p className="text-ink-2">{live ? "Waiting for an inspector to take the job. They will propose visit times inside your windows." : "No visit was set."}</p>
              ) : open.length === 0 ? (
                <p className="text-ink-2">{order.inspector.name} has not proposed a visit time yet.</p>
              ) : (
                <div className="space-y-2">
                  <p className="text-[0.9375rem]">{order.inspector.name} proposed {open.length === 1 ? "this time" : "these times"}. Confirm the one that suits.</p>
                  <ul className="divide-y divide-rule rounded-md border border-rule">
                    {open.map((p) => (
                      <li key={p.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
                        <span className="num">{formatTimeRange(p.start, p.end, tz)}</span>
                        <Button size="sm" pending={busy === p.id} disabled={busy !== null} onClick={() => confirm(p.id)}>
                          Confirm<span className="sr-only"> {formatTimeRange(p.start, p.end, tz)}</span>
                        </Button>
                      </li>
                    ))}
                  </ul>
                  {Date.parse(open[0].end) > Date.parse(order.deadline) ? (
                    <p className="text-sm text-warning">A proposed time ends after the contingency deadline.</p>
                  ) : null}
                </div>
              )}
              <div>
                <p className="text-sm text-ink-2">Your visit windows</p>
                <ul className="mt-1 space-y-0.5">
                  {order.visitWindows.map((w) => (
                    <li key={w.start} className="num text-[0.9375rem]">
                      {formatTimeRange(w.start, w.end, tz)}
                    </li>
                  ))}
                </ul>
              </div>
            </CardBody>
          </Card>

          <Card>
            <CardHeader title="Timeline" description="Every change to this order: what happened, who did it, when and why." />
            <CardBody>
              <OrderTimeline events={events} timeZone={tz} />
            </CardBody>
          </Card>

          <Card>
            <CardHeader title="Order details" />
            <CardBody>
              <dl className="divide-y divide-rule">
                <DetailRow label="Property">
                  {labels.propertyType}
                  {order.yearBuilt ? <>, built <span className="num">{order.yearBuilt}</span></> : null}
                </DetailRow>
                <DetailRow label="Occupancy">{labels.occupancy}</DetailRow>
                <DetailRow label="Access">{order.accessNotes}</DetailRow>
                <DetailRow label="Cleanout">{order.cleanoutKnown ? (order.cleanoutNote ?? "Known") : "None known: toilet pull or roof vent"}</DetailRow>
                <DetailRow label="Building sewers">
                  <span className="num">{order.buildingSewers}</span>
                </DetailRow>
                {order.listingRef ? <DetailRow label="Listing reference">{order.listingRef}</DetailRow> : null}
                {order.notes ? <DetailRow label="Notes">{order.notes}</DetailRow> : null}
                <DetailRow label="Ordered">
                  <span className="num">{formatDateTime(order.createdAt, tz)}</span>
                </DetailRow>
              </dl>
            </CardBody>
          </Card>
        </div>

        <div className="space-y-6">
          <Card>
            <CardHeader title="Contingency deadline" as="h2" />
            <CardBody className="space-y-1">
              <p className="num text-[0.9375rem]">{formatDateTime(order.deadline, tz)}</p>
              {live ? <Countdown to={order.deadline} timeZone={tz} className="text-lg" /> : null}
            </CardBody>
          </Card>

          <Card>
            <CardHeader title="Inspector" />
            <CardBody>
              {order.inspector ? (
                <dl className="space-y-1 text-[0.9375rem]">
                  <dt className="sr-only">Name</dt>
                  <dd className="font-medium">{order.inspector.name}</dd>
                  {order.inspector.company ? (
                    <>
                      <dt className="sr-only">Company</dt>
                      <dd>{order.inspector.company}</dd>
                    </>
                  ) : null}
                  {order.inspector.licenceNumber ? (
                    <>
                      <dt className="inline text-sm text-ink-2">Licence </dt>
                      <dd className="num inline">{order.inspector.licenceNumber}</dd>
                    </>
                  ) : null}
                </dl>
              ) : (
                <p className="text-ink-2">{live ? "Not taken yet. Inspectors who serve this postal code see it on their job board." : "None."}</p>
              )}
            </CardBody>
          </Card>

          <Card>
            <CardHeader title="Buyer" />
            <CardBody className="space-y-2 text-[0.9375rem]">
              <p className="font-medium">{order.buyer.name}</p>
              <p className="break-all text-ink-2">{order.buyer.email}</p>
              <p className="flex items-center gap-2">
                <span className="text-sm text-ink-2">Invitation</span>
                <Badge tone={INVITATION_TEXT[order.buyer.invitation].tone}>{INVITATION_TEXT[order.buyer.invitation].label}</Badge>
              </p>
              <p className="text-sm text-ink-2">{INVITATION_TEXT[order.buyer.invitation].note}</p>
            </CardBody>
          </Card>

          <Card>
            <CardHeader title="Price" description="Paid by the buyer at unlock." />
            <CardBody>
              <dl className="space-y-1.5 text-[0.9375rem]">
                {order.priceLines.map((l) => (
                  <div key={l.label} className="flex items-baseline justify-between gap-4">
                    <dt className="text-ink-2">{l.label}</dt>
                    <dd>
                      <Money cents={l.cents} />
                    </dd>
                  </div>
                ))}
                <div className="flex items-baseline justify-between gap-4 border-t border-rule pt-2 font-semibold">
                  <dt>Total</dt>
                  <dd>
                    <Money cents={order.priceCents} />
                  </dd>
                </div>
              </dl>
            </CardBody>
          </Card>

          {canCancel ? (
            <CancelOrder
              orderId={order.id}
              onCancelled={(d) => {
                void mutate(d, { revalidate: false });
                setMessage({ tone: "success", text: "The order is cancelled. The inspector, if one had taken it, has been told." });
              }}
            />
          ) : null}
        </div>
      </div>
    </div>
  );
}

function CancelOrder({ orderId, onCancelled }: { orderId: string; onCancelled: (d: OrderDetailDto) => void }) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const textRef = useRef<HTMLTextAreaElement>(null);
  const toggleRef = useRef<HTMLButtonElement>(null);

  async function submit(e: FormEvent) {
    e.preventDefault();
    if (reason.trim().length < 3) {
      setError("Give a short reason; it is recorded and sent to the inspector.");
      textRef.current?.focus();
      return;
    }
    setPending(true);
    setError(null);
    const res = await postJson<OrderDetailDto>(`/api/orders/${orderId}/cancel`, { reason: reason.trim() });
    setPending(false);
    if (!res.ok) {
      setError(res.error.fieldErrors?.reason?.[0] ?? res.error.message);
      return;
    }
    onCancelled(res.data);
  }

  return (
    <Card>
      <CardHeader title="Cancel this order" description="Possible until the visit starts. The inspector is told, with your reason." />
      <CardBody>
        {!open ? (
          <Button
            ref={toggleRef}
            variant="secondary"
            onClick={() => {
              setOpen(true);
              requestAnimationFrame(() => textRef.current?.focus());
            }}
          >
            Cancel order…
          </Button>
        ) : (
          <form onSubmit={submit} noValidate className="space-y-3">
            <div className="space-y-1.5">
              <label htmlFor={`${id}-reason`} className="text-sm font-medium text-ink">
                Why are you cancelling?
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
                Cancel the order
              </Button>
              <Button
                variant="ghost"
                onClick={() => {
                  setOpen(false);
                  requestAnimationFrame(() => toggleRef.current?.focus());
                }}
              >
                Keep it
              </Button>
            </div>
          </form>
        )}
      </CardBody>
    </Card>
  );
}
