import Link from "next/link";

import { Badge } from "@/components/ui/badge";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import type { AdminOrder } from "@/db/queries/admin-order";
import { outcomeLabel, reasonLabel } from "@/lib/disputes";
import { formatDateTime } from "@/lib/format";

/** Disputes opened on this order, with the admin's messages and the outcome. */
export function OrderDisputes({ disputes, timeZone }: { disputes: AdminOrder["disputes"]; timeZone: string }) {
  return (
    <Card>
      <CardHeader
        title="Disputes"
        actions={
          <Link href="/admin/disputes" className="text-teal text-sm underline underline-offset-2">
            Dispute queue
          </Link>
        }
      />
      <CardBody>
        {disputes.length === 0 ? (
          <p className="text-ink-2">Nobody has disputed this report.</p>
        ) : (
          <ul className="divide-rule divide-y">
            {disputes.map((d) => (
              <li key={d.id} className="space-y-2 py-3 first:pt-0 last:pb-0">
                <p className="flex flex-wrap items-center gap-2">
                  <span className="font-medium">{reasonLabel(d.reason)}</span>
                  <Badge tone={d.status === "open" ? "warning" : "neutral"}>
                    {d.status === "open" ? "Open" : `Closed: ${outcomeLabel(d.outcome)}`}
                  </Badge>
                </p>
                <p className="text-ink-2 text-sm">
                  Opened by {d.opener.name} ({d.opener.email}) on <span className="num">{formatDateTime(d.createdAt, timeZone)}</span>
                  {d.closedAt ? (
                    <>
                      {" "}
                      · closed <span className="num">{formatDateTime(d.closedAt, timeZone)}</span>
                    </>
                  ) : null}
                </p>
                <blockquote className="border-copper border-l-2 pl-3">{d.message}</blockquote>
                {d.messages.length ? (
                  <ol className="text-ink-2 space-y-1 text-sm">
                    {d.messages.map((m) => (
                      <li key={m.id}>
                        To {m.to} on {formatDateTime(m.at, timeZone)}: {m.body}
                      </li>
                    ))}
                  </ol>
                ) : null}
                {d.outcomeNote ? <p className="text-sm">Decision: {d.outcomeNote}</p> : null}
              </li>
            ))}
          </ul>
        )}
      </CardBody>
    </Card>
  );
}
