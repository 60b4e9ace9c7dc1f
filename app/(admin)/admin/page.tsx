import type { Metadata } from "next";
import Link from "next/link";
import type { ReactNode } from "react";

import { AtRiskBadge } from "@/components/at-risk-badge";
import { Countdown } from "@/components/countdown";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { DataList } from "@/components/ui/data-list";
import { EmptyState } from "@/components/ui/empty-state";
import { Money } from "@/components/ui/money";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/status-badge";
import { countOpenDisputes, countVerificationQueue, moneyThisMonth } from "@/db/queries/admin-overview";
import { listOrdersPage } from "@/db/queries/order-lists";
import { countOrdersByStatus } from "@/db/queries/orders";
import type { OrderStatus } from "@/db/schema";
import { requireUser } from "@/lib/auth/session";
import { formatAddress, formatDateTime } from "@/lib/format";
import type { OrderSummaryDto } from "@/lib/orders/dto";
import { DEFAULT_TIME_ZONE } from "@/lib/time-zones";

export const metadata: Metadata = { title: "Overview" };

const monthName = (firstDay: string) =>
  new Intl.DateTimeFormat("en-US", { month: "long", year: "numeric", timeZone: "UTC" }).format(new Date(`${firstDay}T12:00:00Z`));

export default async function AdminOverviewPage() {
  await requireUser("admin");
  const [byStatus, awaiting, openDisputes, money, atRisk] = await Promise.all([
    countOrdersByStatus(),
    countVerificationQueue(),
    countOpenDisputes(),
    moneyThisMonth(new Date(), DEFAULT_TIME_ZONE),
    listOrdersPage(null, { status: "at_risk", sort: "deadline", dir: "asc", page: 1, pageSize: 20 }),
  ]);
  const month = monthName(money.month);
  return (
    <>
      <PageHeader
        title="Marketplace overview"
        description={`Orders by state, orders at risk of missing their deadline, money in ${month}, open disputes and inspectors waiting for verification.`}
      />

      <section aria-labelledby="month-heading" className="mb-8">
        <h2 id="month-heading" className="sr-only">
          Key figures
        </h2>
        <dl className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3 xl:grid-cols-5">
          <Figure
            label={`Revenue, ${month}`}
            note={
              <>
                Charges <Money cents={money.chargedCents} /> less refunds <Money cents={money.refundedCents} />
              </>
            }
          >
            <Money cents={money.revenueCents} />
          </Figure>
          <Figure label={`Platform fees, ${month}`} note="Net of fees given back with refunds">
            <Money cents={money.feesCents} />
          </Figure>
          <Figure
            label="Orders at risk"
            note={atRisk.total === 0 ? "Every live order can meet its deadline" : "Listed below, soonest deadline first"}
          >
            <span className="num">{atRisk.total}</span>
          </Figure>
          <Figure
            label="Inspectors awaiting verification"
            note={
              <Link href="/admin/inspectors" className="text-teal underline underline-offset-2">
                Open the verification queue
              </Link>
            }
          >
            <span className="num">{awaiting}</span>
          </Figure>
          <Figure
            label="Open disputes"
            note={
              <Link href="/admin/disputes" className="text-teal underline underline-offset-2">
                Open the dispute queue
              </Link>
            }
          >
            <span className="num">{openDisputes}</span>
          </Figure>
        </dl>
      </section>

      <div className="grid gap-6 lg:grid-cols-[1fr_2fr]">
        <Card>
          <CardHeader title="Orders by state" />
          <CardBody>
            <dl className="divide-rule divide-y">
              {(Object.entries(byStatus) as [OrderStatus, number][]).map(([status, n]) => (
                <div key={status} className="flex items-center justify-between py-2">
                  <dt>
                    <StatusBadge status={status} />
                  </dt>
                  <dd className="num text-lg">{n}</dd>
                </div>
              ))}
            </dl>
          </CardBody>
        </Card>

        <Card>
          <CardHeader
            title="Orders at risk"
            description="Live orders whose appointment, or lack of one, cannot meet the contingency deadline. Agents are warned by e-mail."
          />
          <CardBody>
            <AtRiskList orders={atRisk.orders} total={atRisk.total} />
          </CardBody>
        </Card>
      </div>
    </>
  );
}

function Figure({ label, note, children }: { label: string; note: ReactNode; children: ReactNode }) {
  return (
    <div className="rounded-card border-rule shadow-card flex flex-col gap-1 border bg-white px-5 py-4">
      <dt className="text-ink-2 text-sm font-medium">{label}</dt>
      <dd className="text-3xl leading-tight">{children}</dd>
      <dd className="text-ink-2 text-sm">{note}</dd>
    </div>
  );
}

function AtRiskList({ orders, total }: { orders: OrderSummaryDto[]; total: number }) {
  return (
    <>
      <DataList
        caption="Orders at risk, soonest deadline first"
        rows={orders}
        rowKey={(o) => o.id}
        empty={
          <EmptyState
            as="h3"
            title="No order is at risk"
            description="Every live order has an appointment, or time to get one, before its deadline."
          />
        }
        columns={[
          {
            key: "listing",
            header: "Listing",
            primary: true,
            cell: (o) => (
              <Link href={`/admin/orders/${o.id}`} className="text-teal underline underline-offset-2">
                {formatAddress(o.address)}
              </Link>
            ),
          },
          {
            key: "state",
            header: "State",
            cell: (o) => (
              <span className="flex flex-col items-end gap-1 md:items-start">
                <StatusBadge status={o.status} />
                <AtRiskBadge atRisk={o.atRisk} />
              </span>
            ),
          },
          {
            key: "deadline",
            header: "Deadline",
            cell: (o) => (
              <span className="flex flex-col items-end md:items-start">
                <Countdown to={o.deadline} timeZone={o.timeZone} className="text-sm" />
                <span className="num text-ink-2 text-xs whitespace-nowrap">{formatDateTime(o.deadline, o.timeZone)}</span>
              </span>
            ),
          },
          { key: "inspector", header: "Inspector", cell: (o) => <span className="text-sm">{o.inspector?.name ?? "Nobody yet"}</span> },
        ]}
      />
      {total > orders.length ? (
        <p className="text-ink-2 mt-3 text-sm">
          Showing the {orders.length} soonest of {total}.
        </p>
      ) : null}
    </>
  );
}
