import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { DisputePanel } from "@/components/report/dispute-panel";
import { PageHeader } from "@/components/ui/page-header";
import { latestDisputeBy } from "@/db/queries/disputes";
import { getOrderDetailForAgent } from "@/db/queries/order-detail";
import { canSeeReport } from "@/db/queries/reports";
import { requireUser } from "@/lib/auth/session";
import { idParams, OCCUPANCY_LABELS, PROPERTY_TYPE_LABELS } from "@/lib/validations/orders";

import { OrderDetail } from "./order-detail";

export const metadata: Metadata = { title: "Order" };

export default async function OrderPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireUser("agent");
  const parsed = idParams.safeParse(await params);
  if (!parsed.success) notFound();
  const detail = await getOrderDetailForAgent(parsed.data.id, user.id);
  if (!detail) notFound();
  const { address } = detail.order;
  const disputable = ["delivered", "unlocked"].includes(detail.order.status) && (await canSeeReport(detail.order.id, user));
  const labels = {
    propertyType: PROPERTY_TYPE_LABELS[detail.order.propertyType as keyof typeof PROPERTY_TYPE_LABELS] ?? detail.order.propertyType,
    occupancy: OCCUPANCY_LABELS[detail.order.occupancy as keyof typeof OCCUPANCY_LABELS] ?? detail.order.occupancy,
  };
  return (
    <>
      <PageHeader
        back={{ href: "/orders", label: "Orders" }}
        eyebrow="Sewer scope order"
        title={`${address.street}${address.unit ? `, ${address.unit}` : ""}`}
        description={`${address.city}, ${address.state} ${address.postalCode}`}
      />
      <OrderDetail initial={detail} labels={labels} />
      {disputable ? (
        <div className="mt-8">
          <DisputePanel reportId={detail.order.id} initial={await latestDisputeBy(detail.order.id, user.id)} />
        </div>
      ) : null}
    </>
  );
}
