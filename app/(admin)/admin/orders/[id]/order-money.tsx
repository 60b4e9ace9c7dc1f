import Link from "next/link";

import { Badge } from "@/components/ui/badge";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { DataList } from "@/components/ui/data-list";
import { Money } from "@/components/ui/money";
import type { AdminOrder } from "@/db/queries/admin-order";
import { formatDateTime } from "@/lib/format";

const PAYMENT_STATUS = {
  pending: "Pending",
  paid: "Paid",
  expired: "Expired",
  refunded: "Refunded",
  partially_refunded: "Partly refunded",
} as const;
const PAYOUT_STATUS = { waiting: "Waiting", sent: "Sent", reversed: "Reversed", partially_reversed: "Partly reversed" } as const;
const LEDGER_KIND = {
  charge: "Charge",
  fee: "Platform fee",
  transfer: "Transfer to inspector",
  refund: "Refund",
  reversal: "Transfer reversed",
} as const;

/** The order's payments with their refunds and payout, its ledger entries, and whether they balance. */
export function OrderMoney({ order: o }: { order: AdminOrder }) {
  const tz = o.order.timeZone;
  const { balance } = o;
  return (
    <Card>
      <CardHeader
        title="Money"
        description="Payments, refunds, the inspector's payout and every ledger entry of this order."
        actions={
          o.payments.length ? (
            <Badge tone={balance.balanced ? "success" : "danger"}>{balance.balanced ? "Ledger balances" : "Ledger does not balance"}</Badge>
          ) : null
        }
      />
      <CardBody className="space-y-6">
        {o.payments.length === 0 ? (
          <p className="text-ink-2">No payment yet: the buyer pays when unlocking the report.</p>
        ) : (
          <>
            <dl className="grid grid-cols-2 gap-4 sm:grid-cols-4">
              <Figure label="Money in" cents={balance.moneyIn} />
              <Figure label="Accounted for" cents={balance.moneyOut} />
              <Figure label="Refunded" cents={balance.refund ?? 0} />
              <Figure label="Owed to the inspector" cents={balance.owed} />
            </dl>
            <ul className="space-y-4">
              {o.payments.map((p) => (
                <li key={p.id} className="border-rule rounded-md border p-4">
                  <h3 className="flex flex-wrap items-center gap-2 font-semibold">
                    Payment <Money cents={p.amountCents} />{" "}
                    <Badge tone={p.status === "paid" ? "success" : "neutral"}>{PAYMENT_STATUS[p.status]}</Badge>
                  </h3>
                  <p className="text-ink-2 mt-1 text-sm">
                    {p.kind === "reuse" ? "Report reuse · " : ""}
                    {p.buyerEmail} · {p.paidAt ? <>paid {formatDateTime(p.paidAt, tz)}</> : <>started {formatDateTime(p.createdAt, tz)}</>}
                    {p.checkoutSessionId ? <span className="num block break-all">{p.checkoutSessionId}</span> : null}
                  </p>
                  {p.refunds.length ? (
                    <ul className="mt-3 space-y-1 text-sm">
                      {p.refunds.map((r) => (
                        <li key={r.id}>
                          Refund <Money cents={r.amountCents} /> on {formatDateTime(r.at, tz)}
                          {r.by ? ` by ${r.by}` : ""}
                          {r.reason ? <>: “{r.reason}”</> : null}
                        </li>
                      ))}
                    </ul>
                  ) : null}
                  <p className="mt-3 text-sm">
                    {p.payout ? (
                      <>
                        Inspector payout <Money cents={p.payout.amountCents} /> · {PAYOUT_STATUS[p.payout.status]}
                        {p.payout.reversedCents ? (
                          <>
                            {" "}
                            · <Money cents={p.payout.reversedCents} /> reversed
                          </>
                        ) : null}
                        {p.payout.sentAt ? ` · sent ${formatDateTime(p.payout.sentAt, tz)}` : ""}
                        {p.payout.transferId ? <span className="num text-ink-2 block break-all">{p.payout.transferId}</span> : null}
                      </>
                    ) : (
                      "No inspector payout for this payment."
                    )}
                  </p>
                </li>
              ))}
            </ul>
            <p className="text-sm">
              <Link href="/admin/payments" className="text-teal underline underline-offset-2">
                Refund on the payments page
              </Link>
            </p>
          </>
        )}
        <DataList
          caption="Ledger entries, oldest first"
          captionVisible
          rows={o.ledger}
          rowKey={(l) => l.id}
          empty={<p className="text-ink-2 text-sm">No ledger entries yet.</p>}
          columns={[
            { key: "kind", header: "Entry", primary: true, cell: (l) => LEDGER_KIND[l.kind] },
            { key: "amount", header: "Amount", align: "right", cell: (l) => <Money cents={l.amountCents} /> },
            { key: "at", header: "When", cell: (l) => <span className="num text-sm">{formatDateTime(l.at, tz)}</span> },
            {
              key: "ref",
              header: "Reference",
              cell: (l) => <span className="num text-ink-2 text-xs break-all">{l.externalId ?? "—"}</span>,
            },
            { key: "note", header: "Note", cell: (l) => <span className="text-sm">{l.note ?? "—"}</span> },
          ]}
        />
      </CardBody>
    </Card>
  );
}

function Figure({ label, cents }: { label: string; cents: number }) {
  return (
    <div>
      <dt className="text-ink-2 text-sm">{label}</dt>
      <dd className="text-lg">
        <Money cents={cents} />
      </dd>
    </div>
  );
}
