import type { Metadata } from "next";

import { OrdersTable } from "@/components/orders-table";
import { PageHeader } from "@/components/ui/page-header";
import { listOrdersPage } from "@/db/queries/order-lists";
import { requireUser } from "@/lib/auth/session";
import { listOrdersQuery } from "@/lib/validations/orders";

export const metadata: Metadata = { title: "Orders" };

export default async function AdminOrdersPage() {
  await requireUser("admin");
  const initial = await listOrdersPage(null, listOrdersQuery.parse({}));
  return (
    <>
      <PageHeader
        title="Orders"
        description="Every order in the marketplace. Open one for its timeline, payments, disputes and audit trail."
      />
      <OrdersTable scope="admin" initial={initial} />
    </>
  );
}
