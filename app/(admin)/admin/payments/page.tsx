import type { Metadata } from "next";
import Link from "next/link";

import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { Money } from "@/components/ui/money";
import { PageHeader } from "@/components/ui/page-header";
import { listPaymentsForAdmin } from "@/db/queries/admin-payments";
import { ledgerBalance } from "@/db/queries/payouts";
import { requireUser } from "@/lib/auth/session";
import { formatDate } from "@/lib/format";

import { RefundForm } from "./refund-form";

export const metadata: Metadata = { title: "Payments and refunds" };

export default async function AdminPaymentsPage() {
  await requireUser("admin");
  const [rows, balance] = await Promise.all([listPaymentsForAdmin(), ledgerBalance()]);
  return (
    <>
      <PageHeader title="Payments and refunds" description="Every buyer payment, its refunds and the inspector's payout." />
      <Card className="mb-8">
        <CardHeader title="Ledger check" description="Money in must equal transfers out, platform fees, refunds and what is still owed to inspectors." />
        <CardBody>
          <dl className="grid grid-cols-2 gap-4 sm:grid-cols-4">
            <div>
              <dt className="text-sm text-ink-2">Money in</dt>
              <dd className="text-lg">
                <Money cents={balance.moneyIn} />
              </dd>
            </div>
            <div>
              <dt className="text-sm text-ink-2">Accounted for</dt>
              <dd className="text-lg">
                <Money cents={balance.moneyOut} />
              </dd>
            </div>
            <div>
              <dt className="text-sm text-ink-2">Owed to inspectors</dt>
              <dd className="text-lg">
                <Money cents={balance.owed} />
              </dd>
            </div>
            <div>
              <dt className="text-sm text-ink-2">Balanced</dt>
              <dd className={balance.balanced ? "text-lg font-semibold text-success" : "text-lg font-semibold text-danger"}>{balance.balanced ? "Yes" : "No — investigate"}</dd>
            </div>
          </dl>
        </CardBody>
      </Card>
      {rows.length === 0 ? (
        <EmptyState title="No payments yet" />
      ) : (
        <ul className="space-y-4">
          {rows.map((p) => (
            <li key={p.id}>
              <Card>
                <CardHeader
                  as="h2"
                  title={
                    <Link href={`/admin/orders/${p.orderId}`} className="text-teal underline underline-offset-2">
                      {p.address}
                    </Link>
                  }
                  description={`${p.buyerEmail} · ${p.status.replace("_", " ")}${p.paidAt ? ` · paid ${formatDate(p.paidAt)}` : ""}`}
                  actions={
                    <span className="text-lg">
                      <Money cents={p.amountCents} />
                    </span>
                  }
                />
                <CardBody className="space-y-3">
                  <p className="text-sm text-ink-2">
                    Refunded <Money cents={p.refundedCents} />
                    {p.payout ? (
                      <>
                        {" "}
                        · inspector payout <Money cents={p.payout.amountCents} /> ({p.payout.status.replace("_", " ")}
                        {p.payout.reversedCents ? (
                          <>
                            , <Money cents={p.payout.reversedCents} /> reversed
                          </>
                        ) : null}
                        )
                      </>
                    ) : null}
                  </p>
                  {p.status === "paid" || p.status === "partially_refunded" ? <RefundForm paymentId={p.id} remainingCents={p.amountCents - p.refundedCents} /> : null}
                </CardBody>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
