import type { Metadata } from "next";

import { OrdersTable } from "@/components/orders-table";
import { PageHeader } from "@/components/ui/page-header";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Orders" };

export default async function AdminOrdersPage() {
  await requireUser("admin");
  return (
    <>
      <PageHeader
        title="Orders"
        description="Every order in the marketplace. Open one for its timeline, payments, disputes and audit trail."
      />
      <OrdersTable scope="admin" />
    </>
  );
}
