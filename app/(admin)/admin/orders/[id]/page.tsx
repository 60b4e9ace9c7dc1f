import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { OrderTimeline } from "@/components/order-timeline";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/status-badge";
import { getAdminOrder } from "@/db/queries/admin-order";
import { requireUser } from "@/lib/auth/session";
import { idParams } from "@/lib/validations/orders";

import { OrderAudit } from "./order-audit";
import { OrderDisputes } from "./order-disputes";
import { OrderFacts } from "./order-facts";
import { OrderMoney } from "./order-money";

export const metadata: Metadata = { title: "Order" };

export default async function AdminOrderPage({ params }: { params: Promise<{ id: string }> }) {
  await requireUser("admin");
  const parsed = idParams.safeParse(await params);
  if (!parsed.success) notFound();
  const o = await getAdminOrder(parsed.data.id);
  if (!o) notFound();
  const { address, timeZone } = o.order;
  return (
    <>
      <PageHeader
        back={{ href: "/admin/orders", label: "Orders" }}
        eyebrow="Order"
        title={`${address.street}${address.unit ? `, ${address.unit}` : ""}`}
        description={`${address.city}, ${address.state} ${address.postalCode}`}
        actions={<StatusBadge status={o.order.status} className="text-sm" />}
      />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem] lg:items-start">
        <div className="min-w-0 space-y-6">
          <OrderMoney order={o} />
          <OrderDisputes disputes={o.disputes} timeZone={timeZone} />
          <OrderAudit entries={o.audit} timeZone={timeZone} />
        </div>
        <div className="min-w-0 space-y-6">
          <OrderFacts order={o} />
          <Card>
            <CardHeader title="Timeline" description="Every change of state: what, who, when and why." />
            <CardBody>
              <OrderTimeline events={o.events} timeZone={timeZone} />
            </CardBody>
          </Card>
        </div>
      </div>
    </>
  );
}
