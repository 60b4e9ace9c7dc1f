import type { Metadata } from "next";

import { Alert } from "@/components/ui/alert";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { DataList } from "@/components/ui/data-list";
import { EmptyState } from "@/components/ui/empty-state";
import { Money } from "@/components/ui/money";
import { PageHeader } from "@/components/ui/page-header";
import { listEarnings, monthlyTotals, payoutAccountOf } from "@/db/queries/payouts";
import { requireUser } from "@/lib/auth/session";
import { formatDate } from "@/lib/format";

import { ConnectPayoutsButton } from "./connect-payouts-button";

export const metadata: Metadata = { title: "Earnings" };

const STATUS_TEXT = { waiting: "Waiting", sent: "Sent", reversed: "Reversed", partially_reversed: "Partly reversed" } as const;

export default async function EarningsPage({ searchParams }: { searchParams: Promise<{ connect?: string }> }) {
  const user = await requireUser("inspector");
  const [rows, accountId, { connect }] = await Promise.all([listEarnings(user.id), payoutAccountOf(user.id), searchParams]);
  const months = monthlyTotals(rows);
  const waitingCents = rows.filter((r) => r.status === "waiting").reduce((s, r) => s + r.payoutCents - r.reversedCents, 0);
  return (
    <>
      <PageHeader
        title="Earnings"
        description="Every unlocked report you were paid for: the price, Gradeline's fee and your payout."
        actions={
          <a className="text-sm font-medium text-teal underline underline-offset-4" href="/api/payouts/export">
            Download CSV
          </a>
        }
      />
      <div className="mb-6 space-y-4">
        {connect === "done" ? <Alert tone="success">Payout setup finished. Waiting payouts go out within a minute.</Alert> : null}
        {!accountId || waitingCents > 0 ? (
          <Card>
            <CardHeader title={accountId ? "Payout account connected" : "Connect a payout account"} description={waitingCents > 0 ? undefined : "Payouts go to this account after each unlock."} />
            <CardBody className="flex flex-wrap items-center justify-between gap-4">
              <p>
                {waitingCents > 0 ? (
                  <>
                    <Money cents={waitingCents} /> is waiting for you{accountId ? " and goes out once the account can receive payouts." : "."}
                  </>
                ) : (
                  "Connect once; every later payout goes there automatically."
                )}
              </p>
              <ConnectPayoutsButton label={accountId ? "Review payout setup" : "Set up payouts"} />
            </CardBody>
          </Card>
        ) : null}
      </div>
      {rows.length === 0 ? (
        <EmptyState title="No earnings yet" description="When a buyer unlocks one of your reports, your share appears here." />
      ) : (
        <div className="space-y-8">
          <DataList
            caption="Totals by month"
            captionVisible
            rows={months}
            rowKey={(m) => m.month}
            columns={[
              { key: "month", header: "Month", primary: true, cell: (m) => <span className="num">{m.month}</span> },
              { key: "jobs", header: "Jobs", align: "right", cell: (m) => <span className="num">{m.jobs}</span> },
              { key: "price", header: "Price", align: "right", cell: (m) => <Money cents={m.priceCents} /> },
              { key: "fee", header: "Fee", align: "right", cell: (m) => <Money cents={m.feeCents} /> },
              { key: "payout", header: "Your payout", align: "right", cell: (m) => <Money cents={m.payoutCents} /> },
            ]}
          />
          <DataList
            caption="Every job"
            captionVisible
            rows={rows}
            rowKey={(r) => r.payoutId}
            columns={[
              { key: "address", header: "Listing", primary: true, cell: (r) => `${r.street}, ${r.city}` },
              { key: "date", header: "Paid", cell: (r) => (r.paidAt ? <span className="num">{formatDate(r.paidAt)}</span> : "—") },
              { key: "price", header: "Price", align: "right", cell: (r) => <Money cents={r.priceCents} /> },
              { key: "fee", header: "Fee", align: "right", cell: (r) => <Money cents={r.feeCents} /> },
              { key: "payout", header: "Payout", align: "right", cell: (r) => <Money cents={r.payoutCents - r.reversedCents} /> },
              { key: "status", header: "Status", cell: (r) => STATUS_TEXT[r.status] },
            ]}
          />
        </div>
      )}
    </>
  );
}
