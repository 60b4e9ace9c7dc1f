import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { PageHeader } from "@/components/ui/page-header";
import { getOrderDetailForAgent } from "@/db/queries/order-detail";
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
    </>
  );
}
