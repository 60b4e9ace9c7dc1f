import type { Metadata } from "next";

import { DataList } from "@/components/ui/data-list";
import { EmptyState } from "@/components/ui/empty-state";
import { Money } from "@/components/ui/money";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/status-badge";
import { listOrdersForAgent, type OrderSummary } from "@/db/queries/orders";
import { requireUser } from "@/lib/auth/session";
import { formatAddress, formatCountdown, formatDateTime } from "@/lib/format";

export const metadata: Metadata = { title: "Orders" };

export default async function OrdersPage() {
  const user = await requireUser("agent");
  const orders = await listOrdersForAgent(user.id);
  const now = new Date();
  return (
    <>
      <PageHeader title="Orders" description="Every sewer scope you have ordered, with its contingency deadline." />
      {orders.length === 0 ? (
        <EmptyState title="No orders yet" description="Order a sewer scope for a listing and it shows up here with its deadline." />
      ) : (
        <DataList<OrderSummary>
          caption="Your orders"
          rows={orders}
          rowKey={(o) => o.id}
          columns={[
            { key: "address", header: "Listing", primary: true, cell: (o) => formatAddress(o) },
            { key: "status", header: "State", cell: (o) => <StatusBadge status={o.status} /> },
            {
              key: "deadline",
              header: "Contingency deadline",
              cell: (o) => (
                <span>
                  <span className="num">{formatDateTime(o.deadline, o.timeZone)}</span>
                  <span className="block text-xs text-ink-2">{formatCountdown(o.deadline, now)}</span>
                </span>
              ),
            },
            { key: "inspector", header: "Inspector", cell: (o) => o.inspectorName ?? "Waiting for an inspector" },
            { key: "price", header: "Price", align: "right", cell: (o) => <Money cents={o.priceCents} /> },
          ]}
        />
      )}
    </>
  );
}
