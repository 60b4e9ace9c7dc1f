import type { Metadata } from "next";
import Link from "next/link";

import { Badge } from "@/components/ui/badge";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { DISPUTE_OUTCOMES, DISPUTE_REASONS, listDisputes } from "@/db/queries/disputes";
import { requireUser } from "@/lib/auth/session";
import { formatDate } from "@/lib/format";

import { DisputeActions } from "./dispute-actions";

export const metadata: Metadata = { title: "Disputes" };

export default async function DisputesPage() {
  await requireUser("admin");
  const disputes = await listDisputes();
  return (
    <>
      <PageHeader title="Disputes" description="Reports that a buyer or agent disputed: write to the inspector, then close each with an outcome." />
      {disputes.length === 0 ? (
        <EmptyState title="No disputes" description="When a buyer or agent disputes a report, it appears here." />
      ) : (
        <ul className="space-y-4">
          {disputes.map((d) => (
            <li key={d.id}>
              <Card>
                <CardHeader
                  title={d.address}
                  description={`${DISPUTE_REASONS[d.reason as keyof typeof DISPUTE_REASONS] ?? d.reason} · opened by ${d.opener.name} on ${formatDate(d.createdAt)}`}
                  actions={<Badge tone={d.status === "open" ? "warning" : "neutral"}>{d.status === "open" ? "Open" : `Closed: ${DISPUTE_OUTCOMES[d.outcome as keyof typeof DISPUTE_OUTCOMES] ?? d.outcome}`}</Badge>}
                />
                <CardBody className="space-y-3">
                  <blockquote className="border-l-2 border-copper pl-3">{d.message}</blockquote>
                  {d.messages.length ? (
                    <ol className="space-y-1 text-sm text-ink-2">
                      {d.messages.map((m) => (
                        <li key={m.id}>
                          To {m.to} on {formatDate(m.at)}: {m.body}
                        </li>
                      ))}
                    </ol>
                  ) : null}
                  {d.outcomeNote ? <p className="text-sm">Decision: {d.outcomeNote}</p> : null}
                  <p className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
                    <Link className="text-teal underline underline-offset-4" href={`/admin/orders/${d.orderId}`}>
                      Order, payments and audit trail
                    </Link>
                    <Link className="text-teal underline underline-offset-4" href="/admin/payments">
                      Payments and refunds
                    </Link>
                  </p>
                  {d.status === "open" ? <DisputeActions disputeId={d.id} /> : null}
                </CardBody>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
