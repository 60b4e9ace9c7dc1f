import Link from "next/link";
import type { ReactNode } from "react";

import { AtRiskBadge } from "@/components/at-risk-badge";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Money } from "@/components/ui/money";
import type { AdminOrder } from "@/db/queries/admin-order";
import { formatDateTime } from "@/lib/format";
import { formatTimeRange } from "@/lib/time-zones";

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="py-2">
      <dt className="text-ink-2 text-sm">{label}</dt>
      <dd className="text-[0.9375rem] break-words">{children}</dd>
    </div>
  );
}

const when = (iso: string | null, tz: string) => (iso ? <span className="num">{formatDateTime(iso, tz)}</span> : "—");

/** Who is involved, what it costs and when each step happened. */
export function OrderFacts({ order: o }: { order: AdminOrder }) {
  const { order, agent } = o;
  const tz = order.timeZone;
  return (
    <Card>
      <CardHeader title="Order facts" />
      <CardBody>
        <dl className="divide-rule divide-y">
          {order.atRisk.flagged ? (
            <Fact label="Deadline risk">
              <AtRiskBadge atRisk={order.atRisk} />
            </Fact>
          ) : null}
          <Fact label="Order id">
            <span className="num text-sm">{order.id}</span>
          </Fact>
          <Fact label="Buyer's agent">
            {agent.name}
            {agent.company ? `, ${agent.company}` : ""}
            <span className="text-ink-2 block text-sm">{agent.email}</span>
          </Fact>
          <Fact label="Inspector">
            {order.inspector ? `${order.inspector.name}${order.inspector.company ? `, ${order.inspector.company}` : ""}` : "Nobody yet"}
          </Fact>
          <Fact label="Buyer">
            {order.buyer.name}
            <span className="text-ink-2 block text-sm">{order.buyer.email}</span>
          </Fact>
          <Fact label="Price">
            <Money cents={order.priceCents} />{" "}
            <span className="text-ink-2 text-sm">
              (fee <Money cents={o.platformFeeCents} />, inspector <Money cents={order.priceCents - o.platformFeeCents} />)
            </span>
          </Fact>
          {o.reuseOfOrderId ? (
            <Fact label="Report reuse of">
              <Link href={`/admin/orders/${o.reuseOfOrderId}`} className="text-teal underline underline-offset-2">
                The original order
              </Link>
            </Fact>
          ) : null}
          <Fact label="Ordered">{when(order.createdAt, tz)}</Fact>
          <Fact label="Contingency deadline">{when(order.deadline, tz)}</Fact>
          <Fact label="Appointment">
            {order.appointment ? (
              <span className="num">{formatTimeRange(order.appointment.start, order.appointment.end, tz)}</span>
            ) : (
              "None set"
            )}
          </Fact>
          {o.deliveredAt ? <Fact label="Delivered">{when(o.deliveredAt, tz)}</Fact> : null}
          {o.unlockedAt ? <Fact label="Unlocked">{when(o.unlockedAt, tz)}</Fact> : null}
          {o.cancelledAt ? <Fact label="Cancelled">{when(o.cancelledAt, tz)}</Fact> : null}
        </dl>
      </CardBody>
    </Card>
  );
}
